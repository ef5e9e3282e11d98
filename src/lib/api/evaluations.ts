import type { QuoteRequest } from '$lib/acoustics';
import type { PackageResult } from '$lib/quotes/evaluate-packages';
import type { SiteSnapshot } from '$lib/schemas/sites';

export interface EvaluationResponse {
	/** The request as the model saw it (metres, programme resolved). */
	request: QuoteRequest;
	results: PackageResult[];
	assumptions: string[];
	/** The site evaluated; null without one. */
	site: SiteSnapshot | null;
	currency: string;
}

export type ApiResult<T> =
	| { ok: true; data: T }
	| { ok: false; status: number; message: string; errors: Record<string, string[]> };

/** POST /api/evaluations. An aborted call (a newer edit superseded it) rejects with AbortError. */
export async function fetchEvaluations(
	body: Record<string, unknown>,
	signal?: AbortSignal
): Promise<ApiResult<EvaluationResponse>> {
	const response = await fetch('/api/evaluations', {
		method: 'POST',
		headers: { 'content-type': 'application/json', accept: 'application/json' },
		body: JSON.stringify(body),
		signal
	});
	const payload = await response.json().catch(() => ({ message: 'The server sent an unreadable answer.' }));
	if (response.ok) return { ok: true, data: payload as EvaluationResponse };
	return { ok: false, status: response.status, message: payload.message ?? 'Something went wrong.', errors: payload.errors ?? {} };
}

import type { Suggestions } from '$lib/systems/present';
import type { ApiResult } from './evaluations';

export type SuggestionsResponse = Suggestions;

/** POST /api/suggestions as a stream: calls `onChecked` with the count of systems checked so far. */
export async function fetchSuggestions(
	body: Record<string, unknown>,
	onChecked: (checked: number) => void,
	signal?: AbortSignal
): Promise<ApiResult<SuggestionsResponse>> {
	const response = await fetch('/api/suggestions', {
		method: 'POST',
		headers: { 'content-type': 'application/json', accept: 'application/x-ndjson' },
		body: JSON.stringify(body),
		signal
	});
	if (!response.ok || !response.body) {
		const payload = await response.json().catch(() => ({}));
		return { ok: false, status: response.status, message: payload.message ?? 'Something went wrong.', errors: payload.errors ?? {} };
	}
	const reader = response.body.pipeThrough(new TextDecoderStream()).getReader();
	let buffered = '';
	for (;;) {
		const { value, done } = await reader.read();
		if (done) break;
		buffered += value;
		const lines = buffered.split('\n');
		buffered = lines.pop() ?? '';
		for (const line of lines.filter(Boolean)) {
			const message = JSON.parse(line) as { checked?: number; answer?: SuggestionsResponse; problem?: string };
			if (message.checked !== undefined) onChecked(message.checked);
			if (message.answer) return { ok: true, data: message.answer };
			if (message.problem) return { ok: false, status: 422, message: message.problem, errors: {} };
		}
	}
	return { ok: false, status: 500, message: 'The search ended without an answer.', errors: {} };
}

/**
 * HTTP against the fault world, every call bounded: a request that hangs fails the test with the
 * time it waited instead of hanging the suite. Each answer carries how long it took.
 */
import { world } from './world-info';
import { ADMIN, DEMO_PASSWORD, SALES } from '../helpers/demo-accounts';
export { ADMIN, DEMO_PASSWORD, SALES } from '../helpers/demo-accounts';

export interface Answer {
	status: number;
	json: any;
	text: string;
	contentType: string;
	ms: number;
}

/** fetch with a deadline; the answer's body is read inside the same deadline. */
export async function timedFetch(
	url: string,
	init: RequestInit = {},
	timeoutMs = 5000
): Promise<Answer> {
	const started = performance.now();
	let response: Response;
	let text: string;
	try {
		response = await fetch(url, { ...init, signal: AbortSignal.timeout(timeoutMs) });
		text = await response.text();
	} catch (err) {
		const ms = Math.round(performance.now() - started);
		throw new Error(
			`${init.method ?? 'GET'} ${url} gave no answer within ${timeoutMs} ms (${ms} ms: ${(err as Error).message})`
		);
	}
	let json: unknown = null;
	try {
		json = text ? JSON.parse(text) : null;
	} catch {
		json = null;
	}
	return {
		status: response.status,
		json,
		text,
		contentType: response.headers.get('content-type') ?? '',
		ms: Math.round(performance.now() - started)
	};
}

export async function api(
	path: string,
	{
		cookie,
		method = 'GET',
		body,
		timeoutMs = 5000
	}: { cookie?: string; method?: string; body?: unknown; timeoutMs?: number } = {}
): Promise<Answer> {
	const origin = world().origin;
	return timedFetch(
		`${origin}${path}`,
		{
			method,
			headers: {
				accept: 'application/json',
				...(cookie ? { cookie } : {}),
				...(body !== undefined ? { 'content-type': 'application/json', origin } : {})
			},
			body: body === undefined ? undefined : JSON.stringify(body)
		},
		timeoutMs
	);
}

/** A page as a browser asks for it. */
export function page(path: string, cookie: string, timeoutMs = 5000): Promise<Answer> {
	return timedFetch(
		`${world().origin}${path}`,
		{ headers: { accept: 'text/html', cookie }, redirect: 'manual' },
		timeoutMs
	);
}

/** Signs in through the real sign-in form action; returns the cookie header, or throws with the status. */
export async function signIn(
	email: string,
	password = DEMO_PASSWORD,
	timeoutMs = 5000
): Promise<string> {
	const origin = world().origin;
	const response = await fetch(`${origin}/signin`, {
		method: 'POST',
		redirect: 'manual',
		headers: { origin, accept: 'text/html', 'content-type': 'application/x-www-form-urlencoded' },
		body: new URLSearchParams({ email, password, redirectTo: '/' }),
		signal: AbortSignal.timeout(timeoutMs)
	});
	await response.arrayBuffer();
	const cookies = response.headers.getSetCookie().map((c) => c.split(';')[0]);
	if (!cookies.some((c) => c.includes('session-token')))
		throw new Error(`sign-in as ${email} failed with ${response.status}`);
	return cookies.join('; ');
}

/** Polls `probe` until it returns a value (not undefined), at most `timeoutMs`. */
export async function eventually<T>(
	what: string,
	probe: () => Promise<T | undefined>,
	timeoutMs: number,
	everyMs = 200
): Promise<T> {
	const deadline = Date.now() + timeoutMs;
	let lastError: unknown = null;
	for (;;) {
		try {
			const value = await probe();
			if (value !== undefined) return value;
		} catch (err) {
			lastError = err;
		}
		if (Date.now() > deadline) {
			throw new Error(
				`${what}: not within ${timeoutMs} ms${lastError ? ` (last error: ${(lastError as Error).message})` : ''}`
			);
		}
		await new Promise((r) => setTimeout(r, everyMs));
	}
}

/** Rejects if `promise` has not settled within `ms` (for helpers that take no AbortSignal). */
export function within<T>(what: string, ms: number, promise: Promise<T>): Promise<T> {
	let timer: ReturnType<typeof setTimeout> | undefined;
	const late = new Promise<never>(
		(_, reject) =>
			(timer = setTimeout(() => reject(new Error(`${what}: no answer within ${ms} ms`)), ms))
	);
	return Promise.race([promise, late]).finally(() => clearTimeout(timer));
}

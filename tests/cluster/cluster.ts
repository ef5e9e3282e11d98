/**
 * Talking to the cluster test world: the proxy on $ORIGIN, and each app process on its own port
 * (CLUSTER_APP_PORTS) when a test must act through one process and look through the other.
 */
import { DEMO_PASSWORD } from '../helpers/demo-accounts';
export { ADMIN, DEMO_PASSWORD, SALES, WAREHOUSE } from '../helpers/demo-accounts';

export const PROXY = process.env.ORIGIN ?? 'http://127.0.0.1:3100';
export const [PROCESS_A, PROCESS_B] = (process.env.CLUSTER_APP_PORTS ?? '3150 3151')
	.split(' ')
	.map((port) => `http://127.0.0.1:${port}`);

export interface Answer {
	status: number;
	json: any;
	text: string;
	bytes: Buffer;
	/** Which app process nginx chose (the test world's proxy names it). */
	upstream: string | null;
}

export async function call(
	base: string,
	path: string,
	{ cookie, method = 'GET', body, form }: { cookie?: string; method?: string; body?: unknown; form?: FormData } = {}
): Promise<Answer> {
	const response = await fetch(`${base}${path}`, {
		method,
		redirect: 'manual',
		headers: {
			accept: 'application/json',
			// The processes check the origin against the proxy's public address, wherever they are reached.
			origin: PROXY,
			...(cookie ? { cookie } : {}),
			...(body !== undefined ? { 'content-type': 'application/json' } : {})
		},
		body: form ?? (body === undefined ? undefined : JSON.stringify(body))
	});
	const bytes = Buffer.from(await response.arrayBuffer());
	const text = bytes.toString('utf8');
	let json: unknown = null;
	try {
		json = text ? JSON.parse(text) : null;
	} catch {
		json = null;
	}
	return { status: response.status, json, text, bytes, upstream: response.headers.get('x-throwline-upstream') };
}

/** Signs in through the form action (via the proxy unless told otherwise); answers the cookie header. */
export async function signIn(email: string, password = DEMO_PASSWORD, base = PROXY): Promise<string> {
	const response = await fetch(`${base}/signin`, {
		method: 'POST',
		redirect: 'manual',
		headers: { origin: PROXY, accept: 'text/html', 'content-type': 'application/x-www-form-urlencoded' },
		body: new URLSearchParams({ email, password, redirectTo: '/' })
	});
	const cookies = response.headers.getSetCookie().map((c) => c.split(';')[0]);
	if (!cookies.some((c) => c.includes('session-token'))) throw new Error(`sign-in as ${email} failed with ${response.status}`);
	return cookies.join('; ');
}

/** Polls until `check` answers something other than undefined, or fails naming what it waited for. */
export async function eventually<T>(what: string, check: () => Promise<T | undefined>, timeoutMs = 15_000): Promise<T> {
	const deadline = Date.now() + timeoutMs;
	for (;;) {
		const value = await check();
		if (value !== undefined) return value;
		if (Date.now() > deadline) throw new Error(`${what}: not within ${timeoutMs} ms`);
		await new Promise((r) => setTimeout(r, 200));
	}
}

import { BASE_URL, DEMO_PASSWORD } from './browser';

/** Signs in through the real sign-in form action and returns the session cookie header. */
export async function sessionCookie(email: string, password = DEMO_PASSWORD): Promise<string> {
	const response = await fetch(`${BASE_URL}/signin`, {
		method: 'POST',
		redirect: 'manual',
		headers: {
			origin: BASE_URL,
			accept: 'text/html',
			'content-type': 'application/x-www-form-urlencoded'
		},
		body: new URLSearchParams({ email, password, redirectTo: '/' })
	});
	const cookies = response.headers.getSetCookie().map((c) => c.split(';')[0]);
	const session = cookies.find((c) => c.includes('session-token'));
	if (!session) throw new Error(`sign-in as ${email} failed with ${response.status}`);
	return cookies.join('; ');
}

export async function api(
	path: string,
	{ cookie, method = 'GET', body }: { cookie?: string; method?: string; body?: unknown } = {}
): Promise<{ status: number; json: any }> {
	const response = await fetch(`${BASE_URL}${path}`, {
		method,
		headers: {
			accept: 'application/json',
			...(cookie ? { cookie } : {}),
			...(body !== undefined ? { 'content-type': 'application/json', origin: BASE_URL } : {})
		},
		body: body === undefined ? undefined : typeof body === 'string' ? body : JSON.stringify(body)
	});
	const text = await response.text();
	let json: unknown = null;
	try {
		json = text ? JSON.parse(text) : null;
	} catch {
		json = text;
	}
	return { status: response.status, json };
}

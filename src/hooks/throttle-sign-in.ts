import { json, type Handle } from '@sveltejs/kit';
import { throttledSignIn } from '$lib/server/auth/sign-in-throttle';
import { retryMessage } from '$lib/sign-in-backoff';

const CREDENTIALS_CALLBACK = '/auth/callback/credentials';

/**
 * Auth.js's own credentials endpoint (scripts and API clients post there; the sign-in page's action
 * throttles itself) gets the same throttle: 429 with Retry-After while locked. Auth.js answers a
 * refusal with a redirect carrying `error=`, and a success with a redirect that sets the session.
 */
export const throttleSignIn: Handle = async ({ event, resolve }) => {
	if (event.request.method !== 'POST' || event.url.pathname !== CREDENTIALS_CALLBACK) return resolve(event);
	const form = await event.request.clone().formData().catch(() => null);
	const email = String(form?.get('email') ?? '').slice(0, 254);
	const attempt = await throttledSignIn(email, event.getClientAddress(), async () => resolve(event), (response) => {
		const location = response.headers.get('location') ?? '';
		if (location.includes('code=inactive')) return 'not-checked';
		if (location.includes('error=')) return 'refused';
		return response.headers.getSetCookie().some((c) => c.includes('session-token=')) ? 'signed-in' : 'not-checked';
	});
	if (!attempt.throttled) return attempt.value;
	return json(
		{ message: retryMessage(attempt.retryAfterSeconds) },
		{ status: 429, headers: { 'retry-after': String(attempt.retryAfterSeconds) } }
	);
};

import { isRedirect, type Handle } from '@sveltejs/kit';
import { SECURITY_HEADERS } from '$lib/server/security-headers.js';

/**
 * The shared security headers on every answer that passes the hooks (the built server adds them to
 * static files too, see scripts/adapter-node-headers.js). Some answers (Auth.js's redirects,
 * `Response.redirect`) have immutable headers: those are copied, never mutated. A redirect thrown
 * by a later hook becomes a response here, so it carries the headers as well.
 */
export const securityHeaders: Handle = async ({ event, resolve }) => {
	let response: Response;
	try {
		response = await resolve(event);
	} catch (thrown) {
		if (!isRedirect(thrown)) throw thrown;
		response = new Response(null, { status: thrown.status, headers: { location: thrown.location } });
	}
	try {
		for (const [name, value] of Object.entries(SECURITY_HEADERS)) response.headers.set(name, value);
		return response;
	} catch {
		const copy = new Response(response.body, { status: response.status, statusText: response.statusText, headers: new Headers(response.headers) });
		for (const [name, value] of Object.entries(SECURITY_HEADERS)) copy.headers.set(name, value);
		return copy;
	}
};

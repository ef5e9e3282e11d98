import { redirect, type Handle } from '@sveltejs/kit';

// Pages anyone may open. API routes answer 401 themselves, and every route still checks the role
// on the server: this redirect is a convenience for people, not the security boundary.
const OPEN_PREFIXES = ['/signin', '/auth/', '/api/', '/_app/', '/favicon'];

export const guardPages: Handle = async ({ event, resolve }) => {
	const path = event.url.pathname;
	if (!event.locals.user && !OPEN_PREFIXES.some((p) => path === p || path.startsWith(p))) {
		const target = path + event.url.search;
		redirect(303, target === '/' ? '/signin' : `/signin?redirectTo=${encodeURIComponent(target)}`);
	}
	return resolve(event);
};

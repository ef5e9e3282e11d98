import type { Handle } from '@sveltejs/kit';
import { db } from '$lib/server/db';
import { syncStamps } from '$lib/server/cache-stamps';
import { findActiveUser, sessionClaims } from '$lib/server/auth/signed-in-user';
import { unavailable } from './unavailable';

const PUBLIC_PATHS = ['/api/health'];

/**
 * Resolves the session cookie to the current user row, so role and active status are never stale,
 * after bringing the cache up to date with the change stamps.
 */
export const attachUser: Handle = async ({ event, resolve }) => {
	event.locals.user = null;
	db(); // binds the models to the pool before any route uses them
	if (PUBLIC_PATHS.includes(event.url.pathname)) return resolve(event);

	try {
		// Other processes' writes (a deactivation, a price change) act on this request here.
		await syncStamps();
		const claims = await sessionClaims(event);
		if (claims !== null) event.locals.user = await findActiveUser(claims.id, claims.sessionVersion);
	} catch (err) {
		console.error('[attach-user] database unavailable:', (err as Error).message);
		return unavailable(event);
	}
	return resolve(event);
};

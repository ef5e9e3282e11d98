import type { Handle } from '@sveltejs/kit';
import { db } from '$lib/server/db';
import { cached } from '$lib/server/cache';
import { syncStamps } from '$lib/server/cache-stamps';
import { findActiveUser } from '$lib/server/users';
import { unavailable } from './unavailable';

const PUBLIC_PATHS = ['/api/health'];
const SESSION_COOKIES = ['authjs.session-token', '__Secure-authjs.session-token'];

/**
 * The user id in the session cookie. Decrypting the cookie costs more than the rest of a typical API
 * call, so the answer for one cookie value is kept for a few seconds (the person's row is still
 * checked on every request below, so a deactivation is never served from here).
 */
async function sessionUserId(event: Parameters<Handle>[0]['event']): Promise<number | null> {
	const token = SESSION_COOKIES.map((name) => event.cookies.get(name)).find(Boolean);
	if (!token) return null;
	return cached(`session:${token}`, async () => {
		const id = Number((await event.locals.auth())?.user?.id);
		return Number.isInteger(id) && id > 0 ? id : null;
	});
}

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
		const id = await sessionUserId(event);
		if (id !== null) event.locals.user = await findActiveUser(id);
	} catch (err) {
		console.error('[attach-user] database unavailable:', (err as Error).message);
		return unavailable(event);
	}
	return resolve(event);
};

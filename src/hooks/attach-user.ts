import type { Handle } from '@sveltejs/kit';
import { db } from '$lib/server/db';
import { cached } from '$lib/server/cache';
import { syncStamps } from '$lib/server/cache-stamps';
import { findActiveUser } from '$lib/server/users';
import { unavailable } from './unavailable';

const PUBLIC_PATHS = ['/api/health'];
const SESSION_COOKIES = ['authjs.session-token', '__Secure-authjs.session-token'];

/**
 * The user id and session version in the session cookie. Decrypting the cookie costs more than the
 * rest of a typical API call, so the answer for one cookie value is kept for a few seconds: it never
 * changes for that value. The person's row (active, role, current session version) is read on every
 * request below, so an ended session or a deactivation is never served from here.
 */
async function sessionClaims(event: Parameters<Handle>[0]['event']): Promise<{ id: number; sessionVersion: number } | null> {
	const token = SESSION_COOKIES.map((name) => event.cookies.get(name)).find(Boolean);
	if (!token) return null;
	return cached(`session:${token}`, async () => {
		const session = (await event.locals.auth()) as { user?: { id?: string }; sessionVersion?: unknown } | null;
		const id = Number(session?.user?.id);
		const sessionVersion = Number(session?.sessionVersion);
		return Number.isInteger(id) && id > 0 && Number.isInteger(sessionVersion) ? { id, sessionVersion } : null;
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
		const claims = await sessionClaims(event);
		if (claims !== null) event.locals.user = await findActiveUser(claims.id, claims.sessionVersion);
	} catch (err) {
		console.error('[attach-user] database unavailable:', (err as Error).message);
		return unavailable(event);
	}
	return resolve(event);
};

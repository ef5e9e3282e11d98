import type { Handle } from '@sveltejs/kit';
import { db } from '$lib/server/db';
import { findActiveUser } from '$lib/server/users';
import { unavailable } from './unavailable';

const PUBLIC_PATHS = ['/api/health'];

/** Resolves the session cookie to the current user row, so role and active status are never stale. */
export const attachUser: Handle = async ({ event, resolve }) => {
	event.locals.user = null;
	db(); // binds the models to the pool before any route uses them
	if (PUBLIC_PATHS.includes(event.url.pathname)) return resolve(event);

	const session = await event.locals.auth();
	const id = Number(session?.user?.id);
	if (Number.isInteger(id) && id > 0) {
		try {
			event.locals.user = await findActiveUser(id);
		} catch (err) {
			console.error('[attach-user] database unavailable:', (err as Error).message);
			return unavailable(event);
		}
	}
	return resolve(event);
};

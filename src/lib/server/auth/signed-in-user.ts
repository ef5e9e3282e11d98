/**
 * The signed-in person: who they are (`SessionUser`), how a request's session cookie becomes them
 * (`sessionClaims`, then `findActiveUser`, done once per request by the attach-user hook into
 * `locals.user`), and which client's records a contact is limited to. Routes get the person from
 * `requireCapability` / `requireUser` (guards.ts), which read `locals.user`.
 */
import type { Cookies } from '@sveltejs/kit';
import type { Role } from '$lib/permissions';
import type { Transaction } from 'sequelize';
import { cached } from '../cache';
import { bumpStamp } from '../cache-stamps';
import { User } from '../db/models';

/** The names Auth.js gives its session cookie, with and without HTTPS. */
export const SESSION_COOKIES = ['__Secure-authjs.session-token', 'authjs.session-token'] as const;

export interface SessionUser {
	id: number;
	role: Role;
	clientId: number | null;
	name: string;
	email: string;
}

/**
 * The user id and session version in the session cookie. Decrypting the cookie costs more than the
 * rest of a typical API call, so the answer for one cookie value is kept for a few seconds: it never
 * changes for that value. The person's row (active, role, current session version) is read on every
 * request by `findActiveUser`, so an ended session or a deactivation is never served from here.
 */
export async function sessionClaims(event: { cookies: Cookies; locals: App.Locals }): Promise<{ id: number; sessionVersion: number } | null> {
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
 * The signed-in person as of now, if the session's version is still theirs: a deactivated account,
 * a changed role or ended sessions (`endSessions` in services/users) take effect on the next request.
 * The row is read for every request, never from a cache, so that another app process that ended the
 * sessions is obeyed at once too (one primary-key read).
 */
export async function findActiveUser(id: number, sessionVersion: number): Promise<SessionUser | null> {
	const user = await loadActiveUser(id);
	return user && user.sessionVersion === sessionVersion ? withoutVersion(user) : null;
}

function withoutVersion({ sessionVersion: _version, ...user }: SessionUser & { sessionVersion: number }): SessionUser {
	return user;
}

/**
 * Call inside the transaction that changes a user (or right after a single-statement change):
 * every process drops its cached rows.
 */
export function userChanged(transaction?: Transaction): Promise<void> {
	return bumpStamp('users', transaction);
}

async function loadActiveUser(id: number): Promise<(SessionUser & { sessionVersion: number }) | null> {
	const user = await User.findByPk(id, {
		attributes: ['id', 'role', 'clientId', 'name', 'email', 'active', 'sessionVersion']
	});
	if (!user || !user.active) return null;
	return { id: user.id, role: user.role, clientId: user.clientId, name: user.name, email: user.email, sessionVersion: user.sessionVersion };
}

/**
 * The client organisation whose records a contact is limited to. A contact without one gets an id no
 * row has, so they see nothing rather than everything.
 */
export function ownClientId(user: SessionUser): number {
	return user.clientId ?? -1;
}

import type { Role } from '$lib/permissions';
import type { Transaction } from 'sequelize';
import { bumpStamp } from './cache-stamps';
import { User } from './db/models';

export interface SessionUser {
	id: number;
	role: Role;
	clientId: number | null;
	name: string;
	email: string;
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

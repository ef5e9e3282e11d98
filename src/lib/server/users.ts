import type { Role } from '$lib/permissions';
import type { Transaction } from 'sequelize';
import { cached } from './cache';
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
 * The signed-in person as of now: a deactivated account or a changed role takes effect on the next
 * request on every process (user changes call `userChanged`, which bumps the users' change stamp).
 */
export function findActiveUser(id: number): Promise<SessionUser | null> {
	return cached(`user:${id}`, () => loadActiveUser(id));
}

/**
 * Call inside the transaction that changes a user (or right after a single-statement change):
 * every process drops its cached rows.
 */
export function userChanged(transaction?: Transaction): Promise<void> {
	return bumpStamp('users', transaction);
}

async function loadActiveUser(id: number): Promise<SessionUser | null> {
	const user = await User.findByPk(id, {
		attributes: ['id', 'role', 'clientId', 'name', 'email', 'active']
	});
	if (!user || !user.active) return null;
	return { id: user.id, role: user.role, clientId: user.clientId, name: user.name, email: user.email };
}

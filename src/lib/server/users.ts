import type { Role } from '$lib/permissions';
import { cached, invalidate } from './cache';
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
 * request (user changes call `userChanged`, which drops the briefly cached row).
 */
export function findActiveUser(id: number): Promise<SessionUser | null> {
	return cached(`user:${id}`, () => loadActiveUser(id));
}

export function userChanged(): void {
	invalidate('user:');
}

async function loadActiveUser(id: number): Promise<SessionUser | null> {
	const user = await User.findByPk(id, {
		attributes: ['id', 'role', 'clientId', 'name', 'email', 'active']
	});
	if (!user || !user.active) return null;
	return { id: user.id, role: user.role, clientId: user.clientId, name: user.name, email: user.email };
}

import { randomBytes } from 'node:crypto';
import { UniqueConstraintError } from 'sequelize';
import type { UserCreateInput, UserUpdateInput } from '$lib/schemas/users';
import { hashPassword, verifyPassword } from '../auth/password';
import { Client, User } from '../db/models';
import { userChanged } from '../auth/signed-in-user';
import type { UserRow } from '$lib/users/types';
import { DomainError } from './errors';

function toRow(user: User & { client?: Client | null }): UserRow {
	return {
		id: user.id,
		email: user.email,
		name: user.name,
		role: user.role,
		active: user.active,
		clientId: user.clientId,
		clientName: user.client?.name ?? null,
		lastSignInAt: user.lastSignInAt ? user.lastSignInAt.toISOString() : null,
		createdAt: user.createdAt.toISOString()
	};
}

export async function listUsers(): Promise<UserRow[]> {
	const users = await User.findAll({
		include: [{ model: Client, as: 'client', attributes: ['name'] }],
		order: [['name', 'ASC']]
	});
	return users.map(toRow);
}

export async function listClientOptions(): Promise<{ id: number; name: string }[]> {
	const clients = await Client.findAll({ attributes: ['id', 'name'], order: [['name', 'ASC']] });
	return clients.map((c) => ({ id: c.id, name: c.name }));
}

/** Creates an account. With no password given, one is generated and returned once to show the admin. */
export async function createUser(
	input: UserCreateInput
): Promise<{ user: UserRow; generatedPassword: string | null }> {
	const generatedPassword = input.password ? null : randomBytes(9).toString('base64url');
	const clientId = input.role === 'client' ? input.clientId : null;
	if (clientId !== null && !(await Client.findByPk(clientId))) {
		throw new DomainError(422, 'That client does not exist.', { clientId: ['Choose an existing client'] });
	}
	try {
		const created = await User.create({
			email: input.email,
			name: input.name,
			role: input.role,
			clientId,
			passwordHash: await hashPassword(input.password || generatedPassword!),
			passwordSetAt: new Date()
		});
		const user = await User.findByPk(created.id, { include: [{ model: Client, as: 'client' }] });
		return { user: toRow(user!), generatedPassword };
	} catch (err) {
		if (err instanceof UniqueConstraintError) {
			throw new DomainError(409, 'Someone already signs in with that e-mail.', {
				email: ['This e-mail is already in use']
			});
		}
		throw err;
	}
}

/**
 * Ends every session of the person (each session carries the version it was issued with; the
 * attach-user hook compares it on every request). Called on sign-out and deactivation, and by
 * anything that changes or resets a password. Returns the new version.
 */
export async function endSessions(userId: number): Promise<number> {
	await User.increment('sessionVersion', { by: 1, where: { id: userId } });
	await userChanged();
	const user = await User.findByPk(userId, { attributes: ['sessionVersion'] });
	return user?.sessionVersion ?? 0;
}

/** Changes name, role or active status. An admin cannot lock themselves out. */
export async function updateUser(actorId: number, id: number, changes: UserUpdateInput): Promise<UserRow> {
	const user = await User.findByPk(id, { include: [{ model: Client, as: 'client' }] });
	if (!user) throw new DomainError(404, 'No such user.');
	if (actorId === id && (changes.active === false || (changes.role && changes.role !== 'admin'))) {
		throw new DomainError(409, 'You cannot deactivate yourself or drop your own admin role.');
	}
	const role = changes.role ?? user.role;
	const clientId = role === 'client' ? (changes.clientId ?? user.clientId) : null;
	if (role === 'client' && clientId === null) {
		throw new DomainError(422, 'A client account needs a client organisation.', {
			clientId: ['Choose a client']
		});
	}
	await User.sequelize!.transaction(async (transaction) => {
		await user.update({ ...changes, clientId }, { transaction });
		await userChanged(transaction);
	});
	if (changes.active === false) await endSessions(id);
	await user.reload({ include: [{ model: Client, as: 'client' }] });
	return toRow(user);
}

/**
 * Ends the person's other signed-in sessions after their password changes.
 * bumped by session versions
 */
/**
 * Sets one's own password while signed in. Staff give their current password; a client need not, as
 * they may have signed in by link and never had one (the link went to their inbox, which is what a
 * reset would ask for too).
 */
export async function setOwnPassword(userId: number, current: string, password: string): Promise<number> {
	const user = await User.findByPk(userId);
	if (!user || !user.active) throw new DomainError(404, 'No such user.');
	if (user.role !== 'client' && !(await verifyPassword(current, user.passwordHash))) {
		throw new DomainError(422, 'Your current password is not right.', { current: ['Enter your current password'] });
	}
	await user.update({ passwordHash: await hashPassword(password), passwordSetAt: new Date() });
	await userChanged();
	// Every session ends; the account page re-issues its own cookie with the returned version.
	return endSessions(userId);
}

/** Whether the person has chosen a password yet (clients start without one). */
export async function hasChosenPassword(userId: number): Promise<boolean> {
	const user = await User.findByPk(userId, { attributes: ['passwordSetAt'] });
	return Boolean(user?.passwordSetAt);
}

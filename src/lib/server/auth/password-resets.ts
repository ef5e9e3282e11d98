/**
 * Password resets: a one-time link, valid for an hour, e-mailed to the person (staff or client) or
 * sent by an admin. Only a SHA-256 hash of the token is stored; issuing a new link ends older ones.
 */
import { createHash, randomBytes } from 'node:crypto';
import { Op } from 'sequelize';
import { db, PasswordReset, User } from '../db';
import { hashPassword } from './password';
import { endSessions } from '../services/users';
import { userChanged } from './signed-in-user';

export const RESET_VALID_MINUTES = 60;
const hash = (token: string) => createHash('sha256').update(token).digest('hex');

export async function issuePasswordReset(userId: number): Promise<string> {
	const token = randomBytes(32).toString('base64url');
	await db().transaction(async (transaction) => {
		await PasswordReset.update({ expiresAt: new Date() }, { where: { userId, usedAt: null, expiresAt: { [Op.gt]: new Date() } }, transaction });
		await PasswordReset.create({ userId, tokenHash: hash(token), expiresAt: new Date(Date.now() + RESET_VALID_MINUTES * 60_000) }, { transaction });
	});
	return token;
}

async function findUsable(token: string) {
	if (!/^[\w-]{20,100}$/.test(token)) return null;
	const reset = await PasswordReset.findOne({ where: { tokenHash: hash(token), usedAt: null, expiresAt: { [Op.gt]: new Date() } } });
	if (!reset) return null;
	const user = await User.findByPk(reset.userId);
	return user?.active ? { reset, user } : null;
}

/** Whom the link is for, without using it up (the page shows the address). */
export async function peekPasswordReset(token: string): Promise<{ email: string } | null> {
	const found = await findUsable(token);
	return found ? { email: found.user.email } : null;
}

/** Sets the new password and uses the link up; false when it is unknown, used or expired. */
export async function completePasswordReset(token: string, password: string): Promise<{ email: string } | null> {
	const found = await findUsable(token);
	if (!found) return null;
	const passwordHash = await hashPassword(password);
	const done = await db().transaction(async (transaction) => {
		const [used] = await PasswordReset.update({ usedAt: new Date() }, { where: { id: found.reset.id, usedAt: null }, transaction });
		if (used !== 1) return false; // another tab used it first
		await User.update({ passwordHash, passwordSetAt: new Date() }, { where: { id: found.user.id }, transaction });
		return true;
	});
	if (!done) return null;
	await userChanged();
	await endSessions(found.user.id);
	return { email: found.user.email };
}

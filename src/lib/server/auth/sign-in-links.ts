/**
 * Sign-in links for clients: the quote e-mail carries one, so an organiser who has never set a
 * password can open their quote. Tokens are random, stored only as a SHA-256 hash, expire after 14
 * days and work once, and only the newest link of an account works; opening the link shows a page with a button (mail scanners that prefetch links
 * do not press buttons), and pressing it signs the person in.
 */
import { createHash, randomBytes } from 'node:crypto';
import { Op, type Transaction } from 'sequelize';
import { safeRedirectPath } from '$lib/safe-redirect';
import { SignInLink, User } from '../db/models';
import { DomainError } from '../services/errors';
import { hashPassword } from './password';

const VALID_DAYS = 14;
const hash = (token: string) => createHash('sha256').update(token).digest('hex');

export const STAFF_EMAIL_REFUSED = 'This e-mail belongs to a staff account; the client needs an address of their own.';

/**
 * The organisation's client account, made (with an unusable random password) when it has none.
 * An e-mail that already signs in a staff member (or another organisation) is refused: the link
 * mailed with a quote must never open someone else's account.
 */
export async function contactAccountFor(client: { id: number; email: string; contactName: string }, transaction?: Transaction): Promise<User> {
	const existing = await User.findOne({ where: { clientId: client.id, role: 'client', active: true }, order: [['id', 'ASC']], transaction });
	if (existing) return existing;
	const [user] = await User.findOrCreate({
		where: { email: client.email },
		defaults: { email: client.email, name: client.contactName, role: 'client', clientId: client.id, passwordHash: await hashPassword(randomBytes(24).toString('base64url')) },
		transaction
	});
	if (user.role !== 'client' || user.clientId !== client.id) {
		throw new DomainError(422, STAFF_EMAIL_REFUSED, { email: [STAFF_EMAIL_REFUSED] });
	}
	return user;
}

/**
 * The one place links are issued: only for an active client account, and issuing one ends every
 * older unused link of that account.
 */
export async function createSignInLink(userId: number, redirectTo: string, transaction?: Transaction): Promise<string> {
	const user = await User.findByPk(userId, { attributes: ['id', 'role', 'active'], transaction });
	if (!user || user.role !== 'client' || !user.active) {
		throw new DomainError(409, 'Sign-in links are only issued for active client accounts.');
	}
	const now = new Date();
	await SignInLink.update({ expiresAt: now }, { where: { userId, usedAt: null, expiresAt: { [Op.gt]: now } }, transaction });
	const token = randomBytes(32).toString('base64url');
	await SignInLink.create(
		{ userId, tokenHash: hash(token), redirectTo: safeRedirectPath(redirectTo), expiresAt: new Date(Date.now() + VALID_DAYS * 86_400_000) },
		{ transaction }
	);
	return token;
}

async function findUsable(token: string) {
	if (!/^[\w-]{20,100}$/.test(token)) return null;
	const link = await SignInLink.findOne({ where: { tokenHash: hash(token), usedAt: null, expiresAt: { [Op.gt]: new Date() } } });
	if (!link) return null;
	const user = await User.findByPk(link.userId);
	return user?.active && user.role === 'client' ? { link, user } : null;
}

/** For the link page: whom the link is for, without using it up. */
export async function peekSignInLink(token: string): Promise<{ email: string; redirectTo: string } | null> {
	const found = await findUsable(token);
	return found ? { email: found.user.email, redirectTo: found.link.redirectTo } : null;
}

/** Uses the link up and returns the person it signs in, or null when it is unknown, used or expired. */
export async function consumeSignInLink(token: string): Promise<{ id: string; email: string; name: string; role: User['role']; sessionVersion: number } | null> {
	const found = await findUsable(token);
	if (!found) return null;
	const [updated] = await SignInLink.update({ usedAt: new Date() }, { where: { id: found.link.id, usedAt: null } });
	if (updated !== 1) return null; // another tab used it first
	await found.user.update({ lastSignInAt: new Date() });
	return { id: String(found.user.id), email: found.user.email, name: found.user.name, role: found.user.role, sessionVersion: found.user.sessionVersion };
}

import { User } from '../db/models';
import { decoyHashOnce, verifyPassword } from './password';
import type { Role } from '$lib/permissions';

export interface SignedInUser {
	id: string;
	email: string;
	name: string;
	role: Role;
	sessionVersion: number;
}

export type CredentialCheck =
	| { ok: true; user: SignedInUser }
	| { ok: false; reason: 'invalid' | 'inactive' };

/**
 * Checks an e-mail and password. Unknown e-mail and wrong password give the same answer in the
 * same time; only someone who knows the password learns that the account is deactivated.
 */
export async function checkCredentials(email: string, password: string): Promise<CredentialCheck> {
	const user = await User.findOne({ where: { email: email.trim().toLowerCase() } });
	const matches = await verifyPassword(password, user?.passwordHash ?? (await decoyHashOnce()));
	if (!user || !matches) return { ok: false, reason: 'invalid' };
	if (!user.active) return { ok: false, reason: 'inactive' };
	await user.update({ lastSignInAt: new Date() });
	return {
		ok: true,
		user: { id: String(user.id), email: user.email, name: user.name, role: user.role, sessionVersion: user.sessionVersion }
	};
}

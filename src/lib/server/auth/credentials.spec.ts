import { describe, expect, it } from 'vitest';
import { uniqueEmail, useTestDatabase } from '../../../../tests/helpers/db';
import { User } from '../db/models';
import { checkCredentials } from './credentials';
import { hashPassword } from './password';

useTestDatabase();

async function makeUser(active = true) {
	const email = uniqueEmail('signin');
	await User.create({
		email,
		name: 'Test Person',
		role: 'sales',
		active,
		passwordHash: await hashPassword('correct horse battery')
	});
	return email;
}

describe('checkCredentials', () => {
	it('accepts the right password, case-insensitive e-mail', async () => {
		const email = await makeUser();
		const result = await checkCredentials(email.toUpperCase(), 'correct horse battery');
		expect(result).toMatchObject({ ok: true, user: { email, role: 'sales' } });
	});

	it('gives the same answer for a wrong password and an unknown e-mail', async () => {
		const email = await makeUser();
		const wrong = await checkCredentials(email, 'wrong password');
		const unknown = await checkCredentials(uniqueEmail('nobody'), 'correct horse battery');
		expect(wrong).toEqual({ ok: false, reason: 'invalid' });
		expect(unknown).toEqual(wrong);
	});

	it('refuses a deactivated account even with the right password', async () => {
		const email = await makeUser(false);
		expect(await checkCredentials(email, 'correct horse battery')).toEqual({ ok: false, reason: 'inactive' });
	});

	it('does not reveal deactivation to someone without the password', async () => {
		const email = await makeUser(false);
		expect(await checkCredentials(email, 'guess')).toEqual({ ok: false, reason: 'invalid' });
	});

	it('stores only a bcrypt hash, never the password', async () => {
		const email = await makeUser();
		const row = await User.findOne({ where: { email } });
		expect(row!.passwordHash).toMatch(/^\$2[aby]\$10\$/);
		expect(row!.passwordHash).not.toContain('correct horse');
	});
});

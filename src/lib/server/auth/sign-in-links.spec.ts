import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { uniqueEmail, useTestDatabase } from '../../../../tests/helpers/db';
import { Client, SignInLink, User } from '../db/models';
import { contactAccountFor, consumeSignInLink, createSignInLink, peekSignInLink } from './sign-in-links';

useTestDatabase();

async function newClient() {
	const email = uniqueEmail('organiser');
	return Client.create({ name: 'Test organiser', contactName: 'Robin Test', email });
}

describe('sign-in links', () => {
	it('makes one client account per organisation, with a password nobody knows', async () => {
		const client = await newClient();
		const first = await contactAccountFor(client);
		const second = await contactAccountFor(client);
		expect(second.id).toBe(first.id);
		expect(first).toMatchObject({ role: 'client', clientId: client.id, email: client.email });
	});

	it('stores only a hash, works once, and keeps only same-site redirects', async () => {
		const user = await contactAccountFor(await newClient());
		const token = await createSignInLink(user.id, 'https://evil.example/steal');
		const row = await SignInLink.findOne({ where: { userId: user.id } });
		expect(row!.tokenHash).toBe(createHash('sha256').update(token).digest('hex'));
		expect(row!.redirectTo).toBe('/');
		expect(await peekSignInLink(token)).toEqual({ email: user.email, redirectTo: '/' });
		expect(await consumeSignInLink(token)).toMatchObject({ id: String(user.id), role: 'client' });
		expect(await consumeSignInLink(token)).toBeNull();
		expect(await peekSignInLink(token)).toBeNull();
	});

	it('refuses expired links, unknown tokens and deactivated accounts', async () => {
		const user = await contactAccountFor(await newClient());
		const expired = await createSignInLink(user.id, '/quotes/1');
		await SignInLink.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { userId: user.id } });
		expect(await consumeSignInLink(expired)).toBeNull();
		expect(await consumeSignInLink('not-a-real-token-at-all-0000')).toBeNull();
		expect(await consumeSignInLink('../../etc')).toBeNull();
		const fresh = await createSignInLink(user.id, '/quotes/1');
		await User.update({ active: false }, { where: { id: user.id } });
		expect(await consumeSignInLink(fresh)).toBeNull();
	});

	it('issues links only for active client accounts, never for staff', async () => {
		const staff = await User.create({ email: uniqueEmail('staff'), name: 'Staff Person', role: 'admin', passwordHash: 'x' });
		await expect(createSignInLink(staff.id, '/')).rejects.toThrow(/client accounts/);
		expect(await SignInLink.count({ where: { userId: staff.id } })).toBe(0);
	});

	it('never hands a staff account to a client organisation that shares its e-mail', async () => {
		const staff = await User.create({ email: uniqueEmail('desk'), name: 'Desk Person', role: 'sales', passwordHash: 'x' });
		const client = await Client.create({ name: 'Borrowed', contactName: 'Someone', email: staff.email });
		await expect(contactAccountFor(client)).rejects.toMatchObject({ status: 422 });
	});

	it('an older link stops working when a new one is issued', async () => {
		const user = await contactAccountFor(await newClient());
		const older = await createSignInLink(user.id, '/quotes/1');
		const newer = await createSignInLink(user.id, '/quotes/2');
		expect(await peekSignInLink(older)).toBeNull();
		expect(await consumeSignInLink(older)).toBeNull();
		expect(await consumeSignInLink(newer)).toMatchObject({ id: String(user.id) });
	});
});

import { describe, expect, it } from 'vitest';
import { uniqueEmail, useTestDatabase } from '../../../../tests/helpers/db';
import { Client } from '../db/models';
import { findActiveUser } from '../auth/signed-in-user';
import { DomainError } from './errors';
import { createUser, endSessions, updateUser } from './users';

useTestDatabase();

const base = { name: 'New Person', role: 'warehouse' as const, password: '', clientId: null };

describe('user management', () => {
	it('creates an account and generates a first password when none is given', async () => {
		const { user, generatedPassword } = await createUser({ ...base, email: uniqueEmail() });
		expect(user.role).toBe('warehouse');
		expect(user.active).toBe(true);
		expect(generatedPassword).toMatch(/^[\w-]{12}$/);
	});

	it('refuses a second account with the same e-mail (409)', async () => {
		const email = uniqueEmail();
		await createUser({ ...base, email });
		await expect(createUser({ ...base, email })).rejects.toMatchObject({ status: 409 });
	});

	it('ties a client account to its organisation', async () => {
		const client = await Client.create({ name: 'Test Org', contactName: 'T', email: uniqueEmail('org') });
		const { user } = await createUser({ ...base, email: uniqueEmail(), role: 'client', clientId: client.id });
		expect(user).toMatchObject({ clientId: client.id, clientName: 'Test Org' });
	});

	it('changes a role and takes effect on the next request', async () => {
		const { user } = await createUser({ ...base, email: uniqueEmail() });
		await updateUser(-1, user.id, { role: 'sales' });
		expect((await findActiveUser(user.id, 1))?.role).toBe('sales');
	});

	it('a deactivated account no longer resolves to a signed-in user', async () => {
		const { user } = await createUser({ ...base, email: uniqueEmail() });
		await updateUser(-1, user.id, { active: false });
		expect(await findActiveUser(user.id, 1)).toBeNull();
	});

	it('endSessions ends every session issued before: the old version no longer resolves', async () => {
		const { user } = await createUser({ ...base, email: uniqueEmail() });
		expect(await findActiveUser(user.id, 1)).not.toBeNull();
		const version = await endSessions(user.id);
		expect(version).toBe(2);
		expect(await findActiveUser(user.id, 1)).toBeNull();
		expect((await findActiveUser(user.id, 2))?.id).toBe(user.id);
	});

	it('deactivation ends sessions, so reactivating does not bring old ones back', async () => {
		const { user } = await createUser({ ...base, email: uniqueEmail() });
		await updateUser(-1, user.id, { active: false });
		await updateUser(-1, user.id, { active: true });
		expect(await findActiveUser(user.id, 1)).toBeNull();
	});

	it('an admin cannot deactivate themselves or drop their own admin role', async () => {
		const { user } = await createUser({ ...base, role: 'admin', email: uniqueEmail() });
		await expect(updateUser(user.id, user.id, { active: false })).rejects.toBeInstanceOf(DomainError);
		await expect(updateUser(user.id, user.id, { role: 'sales' })).rejects.toMatchObject({ status: 409 });
	});

	it('unknown id is 404', async () => {
		await expect(updateUser(-1, 999_999_999, { name: 'X Y' })).rejects.toMatchObject({ status: 404 });
	});
});

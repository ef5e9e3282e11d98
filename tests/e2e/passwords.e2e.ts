/** Staff reset a forgotten password by e-mail, an admin sends a reset, and a new account needs a chosen role. */
import { describe, expect, it } from 'vitest';
import { waitForMail } from '../fakes/mailbox';
import { linkIn, tag, ADMIN } from '../helpers/deal';
import { BASE_URL } from './browser';
import { api, sessionCookie } from './http';

async function formPost(path: string, fields: Record<string, string>, cookie?: string): Promise<{ status: number; text: string }> {
	const response = await fetch(`${BASE_URL}${path}`, {
		method: 'POST',
		redirect: 'manual',
		headers: { origin: BASE_URL, accept: 'text/html', 'content-type': 'application/x-www-form-urlencoded', ...(cookie ? { cookie } : {}) },
		body: new URLSearchParams(fields)
	});
	return { status: response.status, text: await response.text() };
}

async function newStaff(): Promise<string> {
	const email = `desk-${tag()}@example.test`;
	const created = await api('/api/users', { cookie: await sessionCookie(ADMIN), method: 'POST', body: { email, name: 'Kit Marsh', role: 'sales', password: 'first-password-123' } });
	expect(created.status).toBe(201);
	return email;
}

describe('password resets', () => {
	it('a member of staff asks for a reset, chooses a new password with the link, and the link works once', async () => {
		const email = await newStaff();
		const since = new Date();
		const asked = await api('/api/password-resets', { method: 'POST', body: { email } });
		expect(asked.status).toBe(202);
		const mail = await waitForMail({ to: email, subjectIncludes: 'new password', since });
		const link = new URL(linkIn(mail.text, 'signin/reset'));
		expect(await (await fetch(link, { headers: { accept: 'text/html' } })).text()).toContain('Choose a new password');

		const mismatch = await formPost(link.pathname, { password: 'second-password-456', confirm: 'something-else-789' });
		expect(mismatch.status).toBe(400);
		const done = await formPost(link.pathname, { password: 'second-password-456', confirm: 'second-password-456' });
		expect(done.status).toBe(200);
		await expect(sessionCookie(email, 'second-password-456')).resolves.toContain('session-token');
		await expect(sessionCookie(email, 'first-password-123')).rejects.toThrow();

		const again = await formPost(link.pathname, { password: 'third-password-000', confirm: 'third-password-000' });
		expect(again.status).toBe(410);
	});

	it('an admin sends a reset from the users page and is told where it went; a newer link ends the older one', async () => {
		const email = await newStaff();
		const admin = await sessionCookie(ADMIN);
		const users = await api('/api/users', { cookie: admin });
		const id = users.json.find((u: { email: string }) => u.email === email).id;
		const since = new Date();
		const first = await api('/api/password-resets', { method: 'POST', body: { email } });
		expect(first.status).toBe(202);
		const firstMail = await waitForMail({ to: email, subjectIncludes: 'new password', since });
		const sent = await formPost('/admin/users?/sendReset', { id: String(id) }, admin);
		expect(sent.status).toBe(200);
		expect(sent.text).toContain(`went to ${email}`);
		const older = new URL(linkIn(firstMail.text, 'signin/reset'));
		expect(await (await fetch(older, { headers: { accept: 'text/html' } })).text()).toContain('This link has expired');
	});
});

describe('accounts', () => {
	it('a new person is not created without a chosen role', async () => {
		const refused = await formPost('/admin/users?/create', { name: 'No Role Yet', email: `norole-${tag()}@example.test`, role: '', password: '' }, await sessionCookie(ADMIN));
		expect(refused.status).toBe(400);
		expect(refused.text).toContain('Choose a role');
	});
});

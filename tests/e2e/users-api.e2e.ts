import { randomUUID } from 'node:crypto';
import { beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchBrowser, signIn } from './browser';
import { api, sessionCookie } from './http';
import { ADMIN } from '../helpers/demo-accounts';

const cookies: Record<string, string> = {};
beforeAll(async () => {
	for (const role of ['admin', 'warehouse', 'sales']) {
		cookies[role] = await sessionCookie(`${role}@kestrel-yard.test`);
	}
	cookies.client = await sessionCookie('organiser@millbrook-riverside.test');
});

describe('a form posted to the reserved action name', () => {
	it('is a 400, not a server error', async () => {
		const response = await fetch(`${process.env.ORIGIN ?? 'http://127.0.0.1:3100'}/signin?/default`, {
			method: 'POST',
			headers: { origin: process.env.ORIGIN ?? 'http://127.0.0.1:3100', 'content-type': 'application/x-www-form-urlencoded' },
			body: 'email=a%40b.test&password=x'
		});
		expect(response.status).toBe(400);
	});
});

describe('GET /api/health', () => {
	it('answers ok with the database up, signed in or not', async () => {
		expect(await api('/api/health')).toEqual({ status: 200, json: { status: 'ok', db: 'ok' } });
	});
});

describe('/api/users by role', () => {
	it.each([
		['signed out', undefined, 401],
		['warehouse', 'warehouse', 403],
		['sales', 'sales', 403],
		['client', 'client', 403],
		['admin', 'admin', 200]
	])('GET as %s → %i', async (_label, role, status) => {
		const result = await api('/api/users', { cookie: role ? cookies[role] : undefined });
		expect(result.status).toBe(status);
		if (status === 200) expect(result.json.map((u: { email: string }) => u.email)).toContain(ADMIN);
		else expect(result.json).toHaveProperty('message');
	});

	it('POST by a non-admin is 403 and creates nothing', async () => {
		const email = `x-${randomUUID().slice(0, 6)}@example.test`;
		const result = await api('/api/users', {
			cookie: cookies.sales,
			method: 'POST',
			body: { email, name: 'Nope', role: 'admin' }
		});
		expect(result.status).toBe(403);
		const list = await api('/api/users', { cookie: cookies.admin });
		expect(list.json.some((u: { email: string }) => u.email === email)).toBe(false);
	});

	it('bad input gets 422 with a message per field; broken JSON 400', async () => {
		const bad = await api('/api/users', {
			cookie: cookies.admin,
			method: 'POST',
			body: { email: 'nope', name: '', role: 'overlord', password: 'short' }
		});
		expect(bad.status).toBe(422);
		expect(Object.keys(bad.json.errors).sort()).toEqual(['email', 'name', 'password', 'role']);
		const broken = await api('/api/users', { cookie: cookies.admin, method: 'POST', body: '{"email":' });
		expect(broken.status).toBe(400);
	});
});

describe('deactivation', () => {
	let browser: Browser;
	beforeAll(async () => {
		browser = await launchBrowser();
		return () => browser.close();
	});

	it('an admin creates, then deactivates an account; that person can no longer sign in', async () => {
		const email = `temp-${randomUUID().slice(0, 6)}@example.test`;
		const created = await api('/api/users', {
			cookie: cookies.admin,
			method: 'POST',
			body: { email, name: 'Temporary Tech', role: 'warehouse', password: 'a-long-password-1' }
		});
		expect(created.status).toBe(201);
		const theirCookie = await sessionCookie(email, 'a-long-password-1');
		expect((await api('/api/health', { cookie: theirCookie })).status).toBe(200);

		const patched = await api(`/api/users/${created.json.user.id}`, {
			cookie: cookies.admin,
			method: 'PATCH',
			body: { active: false }
		});
		expect(patched.status).toBe(200);
		expect(patched.json.active).toBe(false);

		// Their open session stops working at once, and sign-in is refused with a clear message.
		expect((await api('/api/users', { cookie: theirCookie })).status).toBe(401);
		const page = await browser.newPage();
		await signIn(page, email, 'a-long-password-1');
		await expect(page.getByRole('alert').textContent()).resolves.toMatch(/deactivated/);
		await page.close();
	});

	it('PATCH an unknown id is 404; a non-numeric id is 404', async () => {
		expect((await api('/api/users/999999', { cookie: cookies.admin, method: 'PATCH', body: { name: 'Aa Bb' } })).status).toBe(404);
		expect((await api('/api/users/abc', { cookie: cookies.admin, method: 'PATCH', body: {} })).status).toBe(404);
	});
});

/**
 * A deactivation or a role change made through one process acts on the very next request served by
 * the other, though both had the person's row cached a moment before (change stamps in MariaDB).
 */
import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { ADMIN, call, PROCESS_A, PROCESS_B, signIn } from './cluster';

async function newStaff(admin: string, role: 'sales' | 'warehouse') {
	const email = `cluster-${role}-${randomUUID().slice(0, 8)}@example.test`;
	const password = `pw-${randomUUID()}`;
	const created = await call(PROCESS_A, '/api/users', { cookie: admin, method: 'POST', body: { email, name: 'Cluster Test', role, password } });
	expect(created.status, created.text).toBe(201);
	return { id: created.json.user.id as number, cookie: await signIn(email, password) };
}

describe('user changes across processes', () => {
	it('deactivated through process A, refused by process B on the next request', async () => {
		const admin = await signIn(ADMIN);
		const person = await newStaff(admin, 'sales');
		for (const base of [PROCESS_A, PROCESS_B, PROCESS_B]) {
			expect((await call(base, '/api/quotes', { cookie: person.cookie })).status).toBe(200);
		}
		const changed = await call(PROCESS_A, `/api/users/${person.id}`, { cookie: admin, method: 'PATCH', body: { active: false } });
		expect(changed.status, changed.text).toBe(200);
		expect((await call(PROCESS_B, '/api/quotes', { cookie: person.cookie })).status).toBe(401);
		expect((await call(PROCESS_A, '/api/quotes', { cookie: person.cookie })).status).toBe(401);
	});

	it('a role taken away through process A no longer opens the door on process B', async () => {
		const admin = await signIn(ADMIN);
		const person = await newStaff(admin, 'sales');
		expect((await call(PROCESS_B, '/api/quotes', { cookie: person.cookie })).status).toBe(200);
		const changed = await call(PROCESS_A, `/api/users/${person.id}`, { cookie: admin, method: 'PATCH', body: { role: 'warehouse' } });
		expect(changed.status, changed.text).toBe(200);
		expect((await call(PROCESS_B, '/api/quotes', { cookie: person.cookie })).status).toBe(403);
	});
});

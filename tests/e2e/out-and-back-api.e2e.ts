/**
 * The out-and-back API over HTTP against the built app: who may read and act, what a client sees of
 * their own hire, scans out and back with bad input and refusals, repairs, and availability queries.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { api } from './http';
import { makeOwnBooking, type OwnBooking } from './out-and-back-helpers';
import { signInEveryone, type Sessions } from './proof/people';

let sessions: Sessions;
let own: OwnBooking;

beforeAll(async () => {
	sessions = await signInEveryone();
	own = await makeOwnBooking(sessions);
}, 120_000);

const scan = (path: 'dispatch' | 'return', serial: unknown, cookie = sessions.warehouse) =>
	api(`/api/bookings/${own.bookingId}/${path}`, { cookie, method: 'POST', body: { serial } });

describe('reading bookings by role', () => {
	it('staff list every booking with its state; a client only their own, without staff detail; signed out is 401', async () => {
		for (const role of ['admin', 'warehouse', 'sales'] as const) {
			const { status, json } = await api('/api/bookings', { cookie: sessions[role] });
			expect(status).toBe(200);
			expect(json.find((b: { id: number }) => b.id === own.bookingId)).toMatchObject({ state: 'confirmed', needed: 3 });
		}
		const mine = await api('/api/bookings', { cookie: sessions.client });
		expect(mine.status).toBe(200);
		const row = mine.json.find((b: { id: number }) => b.id === own.bookingId);
		expect(row).toMatchObject({ state: 'confirmed', stateWords: expect.stringMatching(/^Confirmed/) });
		expect(row).not.toHaveProperty('clientName');
		const theirs = await api('/api/bookings', { cookie: sessions.stranger });
		expect(theirs.json.some((b: { id: number }) => b.id === own.bookingId)).toBe(false);
		expect((await api('/api/bookings')).status).toBe(401);
		expect((await api('/api/bookings?state=lost', { cookie: sessions.admin })).json.errors.state).toBeDefined();
	});

	it('one booking: staff get the pick list, the client its state in words, another client 404', async () => {
		const staff = await api(`/api/bookings/${own.bookingId}`, { cookie: sessions.sales });
		expect(staff.json.lines.find((l: { modelType: string }) => l.modelType === 'loudspeaker')).toMatchObject({ quantity: 2, missing: 2 });
		const client = await api(`/api/bookings/${own.bookingId}`, { cookie: sessions.client });
		expect(client.status).toBe(200);
		expect(client.json).not.toHaveProperty('lines');
		expect((await api(`/api/bookings/${own.bookingId}`, { cookie: sessions.stranger })).status).toBe(404);
	});
});

describe('scanning out and back', () => {
	it('refuses bad input with 400/422 and field errors, and the wrong roles with 403', async () => {
		const unreadable = await api(`/api/bookings/${own.bookingId}/dispatch`, { cookie: sessions.warehouse, method: 'POST', body: '{"serial":' });
		expect(unreadable.status).toBe(400);
		const empty = await scan('dispatch', '');
		expect(empty.status).toBe(422);
		expect(empty.json.errors.serial[0]).toMatch(/Scan or type a serial/);
		expect((await scan('dispatch', 'has spaces')).status).toBe(422);
		expect((await scan('dispatch', 42)).status).toBe(422);
		for (const role of ['sales', 'client', 'stranger'] as const) expect((await scan('dispatch', own.speakers[0].serial, sessions[role])).status).toBe(403);
		expect((await api(`/api/bookings/${own.bookingId}/dispatch`, { method: 'POST', body: { serial: own.speakers[0].serial } })).status).toBe(401);
	});

	it('a wrong scan says why (409) and changes nothing; an overdue test keeps a unit in', async () => {
		const unknown = await scan('dispatch', 'NOT-A-UNIT-1');
		expect(unknown.status).toBe(409);
		expect(unknown.json.message).toMatch(/No unit has the serial NOT-A-UNIT-1/);
		expect(unknown.json.errors.serial).toHaveLength(1);
		expect((await api(`/api/stock-units/${own.speakers[2].id}`, { cookie: sessions.admin, method: 'PATCH', body: { lastTestedAt: '2001-01-01' } })).status).toBe(200);
		const overdue = await scan('dispatch', own.speakers[2].serial);
		expect(overdue.status).toBe(409);
		expect(overdue.json.message).toMatch(/overdue for its electrical safety test/);
		const pick = await api(`/api/bookings/${own.bookingId}`, { cookie: sessions.warehouse });
		expect(pick.json.booking.state).toBe('confirmed');
	});

	it('out in part, then all, back in part, then all; the client reads each state in plain words', async () => {
		const first = await scan('dispatch', own.speakers[0].serial);
		expect(first.status).toBe(200);
		expect(first.json).toMatchObject({ state: 'out', serial: own.speakers[0].serial });
		const words = async () => (await api(`/api/bookings/${own.bookingId}`, { cookie: sessions.client })).json.stateWords;
		expect(await words()).toMatch(/^Partly out: 1 of 3/);
		expect((await scan('dispatch', own.speakers[1].serial)).status).toBe(200);
		expect((await scan('dispatch', own.amps[0].serial)).status).toBe(200);
		expect(await words()).toMatch(/^Out: all 3/);
		expect((await scan('return', own.speakers[0].serial)).json.state).toBe('out');
		expect(await words()).toMatch(/^Partly back: 1 of 3/);
		expect((await scan('return', own.speakers[0].serial)).status).toBe(409);
		await scan('return', own.speakers[1].serial);
		expect((await scan('return', own.amps[0].serial)).json.state).toBe('back');
		expect(await words()).toMatch(/^Back/);
	});
});

describe('repairs', () => {
	it('records repairs with validation; done returns a unit in repair to ready; sales reads, clients may not', async () => {
		const url = `/api/stock-units/${own.speakers[0].id}/repairs`;
		const bad = await api(url, { cookie: sessions.warehouse, method: 'POST', body: { description: '', costMinor: 12.5, done: 'yes' } });
		expect(bad.status).toBe(422);
		expect(Object.keys(bad.json.errors).sort()).toEqual(['costMinor', 'description', 'done']);
		await api(`/api/stock-units/${own.speakers[0].id}`, { cookie: sessions.admin, method: 'PATCH', body: { status: 'in-repair' } });
		const done = await api(url, { cookie: sessions.warehouse, method: 'POST', body: { description: 'Driver replaced', costMinor: 8900, done: true } });
		expect(done.status).toBe(201);
		expect(done.json.status).toBe('ready');
		const list = await api(url, { cookie: sessions.sales });
		expect(list.json[0]).toMatchObject({ description: 'Driver replaced', costMinor: 8900, done: true });
		expect((await api(url, { cookie: sessions.sales, method: 'POST', body: { description: 'x', costMinor: 0, done: false } })).status).toBe(403);
		expect((await api(url, { cookie: sessions.client })).status).toBe(403);
		expect((await api('/api/stock-units/4294967295/repairs', { cookie: sessions.admin })).status).toBe(404);
	});
});

describe('availability', () => {
	it('answers week by week per model, and 422 with field errors for bad parameters', async () => {
		const from = '2026-12-01';
		const ok = await api(`/api/availability?from=${from}&to=2027-01-31&model=loudspeaker:${own.speakerId}`, { cookie: sessions.sales });
		expect(ok.status).toBe(200);
		expect(ok.json[0].weeks.length).toBe(9); // the Mondays from 30 Nov to 25 Jan
		expect(ok.json[0].weeks[0]).toMatchObject({ weekStart: '2026-11-30', inService: 3 });
		const missing = await api('/api/availability', { cookie: sessions.admin });
		expect(missing.status).toBe(422);
		expect(Object.keys(missing.json.errors).sort()).toEqual(['from', 'to']);
		expect((await api(`/api/availability?from=2027-01-01&to=2026-01-01`, { cookie: sessions.admin })).json.errors.to).toBeDefined();
		expect((await api(`/api/availability?from=${from}&to=2028-12-31`, { cookie: sessions.admin })).status).toBe(422);
		expect((await api(`/api/availability?from=${from}&to=2027-01-01&model=drum:1`, { cookie: sessions.admin })).json.errors.model).toBeDefined();
		expect((await api(`/api/availability?from=${from}&to=2027-01-01&model=loudspeaker:4294967295`, { cookie: sessions.admin })).status).toBe(404);
		expect((await api(`/api/availability?from=${from}&to=2027-01-01`, { cookie: sessions.client })).status).toBe(403);
	});
});

import { describe, expect, it } from 'vitest';
import { BASE_URL } from './browser';
import { api, sessionCookie } from './http';
import { SALES } from '../helpers/demo-accounts';


const request = {
	targetDb: 98, weighting: 'A', distance: 30, distanceUnit: 'm', programme: 'speech',
	startDate: '2033-07-02', endDate: '2033-07-03'
};

describe('POST /api/suggestions', () => {
	it('answers up to five clear systems in stock, cheapest first, each priced, weighed and explained', async () => {
		const response = await api('/api/suggestions', { cookie: await sessionCookie(SALES), method: 'POST', body: request });
		expect(response.status).toBe(200);
		const { systems, complete, obstacles } = response.json;
		expect(typeof complete).toBe('boolean');
		expect(Array.isArray(obstacles)).toBe(true);
		expect(systems.length).toBeGreaterThan(0);
		expect(systems.length).toBeLessThanOrEqual(5);
		for (const s of systems) {
			expect(s.outcome).toBe('clear');
			expect(s.availability.ok).toBe(true);
			expect(s.groups.length).toBeGreaterThan(0);
			expect(s.totalMinor).toBeGreaterThan(0);
			expect(s.weightKg).toBeGreaterThan(0);
			expect(typeof s.why).toBe('string');
		}
		const totals = systems.map((s: { price: { subtotalMinor: number } }) => s.price.subtotalMinor);
		expect(totals).toEqual([...totals].sort((a, b) => a - b));
	});

	it('says what stands in the way when nothing in stock can be clear', async () => {
		const response = await api('/api/suggestions', { cookie: await sessionCookie(SALES), method: 'POST', body: { ...request, targetDb: 135, distance: 400 } });
		expect(response.status).toBe(200);
		expect(response.json.systems).toEqual([]);
		expect(response.json.obstacles.length).toBeGreaterThan(0);
	});

	it('says which receiver stands in the way and offers the closest systems when the site allows no clear system', async () => {
		// A neighbour close behind the system with a low dB(C) limit: every system meets the level, none keeps the neighbour within it.
		const site = { aimDeg: 0, groundFactor: 0.5, receivers: [{ name: 'Cottage behind', x: 0, y: -60, limitDb: 70, weighting: 'C' }] };
		const response = await api('/api/suggestions', { cookie: await sessionCookie(SALES), method: 'POST', body: { ...request, targetDb: 104, site } });
		expect(response.status).toBe(200);
		expect(response.json.systems).toEqual([]);
		expect(response.json.obstacles.join(' ')).toContain('Cottage behind');
		expect(response.json.closest.length).toBeGreaterThan(0);
		for (const s of response.json.closest) expect(s.availability.ok).toBe(true);
	});

	it('keeps the app answering while a search runs in its worker, and refuses a second search meanwhile with 503 and Retry-After', async () => {
		const cookie = await sessionCookie(SALES);
		const site = { aimDeg: 0, groundFactor: 0.5, receivers: [{ name: 'Cottage behind', x: 0, y: -60, limitDb: 70, weighting: 'C' }] };
		const headers = { cookie, origin: BASE_URL, 'content-type': 'application/json' };
		const search = await fetch(`${BASE_URL}/api/suggestions`, {
			method: 'POST',
			headers: { ...headers, accept: 'application/x-ndjson' },
			body: JSON.stringify({ ...request, targetDb: 104, site })
		});
		expect(search.status).toBe(200);
		// The answer has started, so the search holds this process's place until its last line.
		let searchEndedAt = 0;
		const lines = search.text().then((text) => {
			searchEndedAt = Date.now();
			return text.trim().split('\n').map((l) => JSON.parse(l));
		});
		const [health, second] = await Promise.all([
			fetch(`${BASE_URL}/api/health`),
			fetch(`${BASE_URL}/api/suggestions`, { method: 'POST', headers: { ...headers, accept: 'application/json' }, body: JSON.stringify(request) })
		]);
		const answeredAt = Date.now();
		expect(health.status).toBe(200);
		expect(second.status).toBe(503);
		expect(Number(second.headers.get('retry-after'))).toBeGreaterThanOrEqual(1);
		expect((await second.json()).message).toMatch(/another search/i);
		const answer = (await lines).at(-1);
		expect(answeredAt).toBeLessThanOrEqual(searchEndedAt);
		expect(answer.answer.closest.length).toBeGreaterThan(0);
	});

	it('refuses a malformed request with the field errors, as evaluations do', async () => {
		const response = await api('/api/suggestions', { cookie: await sessionCookie(SALES), method: 'POST', body: { ...request, targetDb: 'loud' } });
		expect(response.status).toBe(422);
		expect(response.json.errors.targetDb).toBeDefined();
	});
});

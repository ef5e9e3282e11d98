import { describe, expect, it } from 'vitest';
import { api, sessionCookie } from './http';

const SALES = 'sales@kestrel-yard.test';

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

	it('refuses a malformed request with the field errors, as evaluations do', async () => {
		const response = await api('/api/suggestions', { cookie: await sessionCookie(SALES), method: 'POST', body: { ...request, targetDb: 'loud' } });
		expect(response.status).toBe(422);
		expect(response.json.errors.targetDb).toBeDefined();
	});
});

/** /api/sites by role, its refusals, and POST /api/evaluations with a saved or an entered site. */
import { beforeAll, describe, expect, it } from 'vitest';
import { api, sessionCookie } from './http';

const cookies: Record<string, string> = {};
beforeAll(async () => {
	for (const role of ['admin', 'warehouse', 'sales']) cookies[role] = await sessionCookie(`${role}@kestrel-yard.test`);
	cookies.client = await sessionCookie('organiser@millbrook-riverside.test');
});

// Round test figures, not the demo sites.
const body = (name: string) => ({
	name,
	ground: 'porous',
	aimDeg: 0,
	receivers: [
		{ name: 'Behind', x: 0, y: -60, limitDb: 60, weighting: 'A', period: '15 min Leq' },
		{ name: 'Ahead', x: 0, y: 400, limitDb: 75, weighting: 'C' },
		{ name: 'Side', x: 300, y: 0, limitDb: 70, weighting: 'Z', bandHz: 63 }
	]
});

describe('/api/sites', () => {
	it('lets sales create, read, replace, change and delete a site', async () => {
		const created = await api('/api/sites', { cookie: cookies.sales, method: 'POST', body: body('API test park') });
		expect(created.status).toBe(201);
		expect(created.json.receivers).toHaveLength(3);
		const id = created.json.id;
		expect((await api(`/api/sites/${id}`, { cookie: cookies.warehouse })).json.name).toBe('API test park');
		expect((await api('/api/sites', { cookie: cookies.warehouse })).json.some((s: { id: number }) => s.id === id)).toBe(true);

		const replaced = await api(`/api/sites/${id}`, { cookie: cookies.sales, method: 'PUT', body: { ...body('API test park 2'), receivers: [] } });
		expect(replaced.status).toBe(200);
		expect(replaced.json).toMatchObject({ name: 'API test park 2', receivers: [] });
		const patched = await api(`/api/sites/${id}`, { cookie: cookies.admin, method: 'PATCH', body: { allowanceDb: 3 } });
		expect(patched.json).toMatchObject({ allowanceDb: 3, name: 'API test park 2' });

		expect((await api(`/api/sites/${id}`, { cookie: cookies.sales, method: 'DELETE' })).status).toBe(204);
		expect((await api(`/api/sites/${id}`, { cookie: cookies.sales })).status).toBe(404);
		expect((await api(`/api/sites/${id}`, { cookie: cookies.sales, method: 'DELETE' })).status).toBe(404);
	});

	it.each([
		['signed out', undefined, 401, 401],
		['client', 'client', 403, 403],
		['warehouse', 'warehouse', 200, 403]
	])('as %s: read %i, write %i', async (_label, role, read, write) => {
		const cookie = role ? cookies[role] : undefined;
		expect((await api('/api/sites', { cookie })).status).toBe(read);
		expect((await api('/api/sites', { cookie, method: 'POST', body: body('Not allowed') })).status).toBe(write);
	});

	it('answers bad input with 400/404/422 and field errors', async () => {
		const noLimit = body('Bad');
		delete (noLimit.receivers[0] as { limitDb?: number }).limitDb;
		const missing = await api('/api/sites', { cookie: cookies.sales, method: 'POST', body: noLimit });
		expect(missing.status).toBe(422);
		expect(Object.keys(missing.json.errors)).toEqual(['receivers.0.limitDb']);

		const g = await api('/api/sites', { cookie: cookies.sales, method: 'POST', body: { ...body('Bad G'), ground: 'custom', groundFactor: 1.5 } });
		expect(g.status).toBe(422);
		expect(Object.keys(g.json.errors)).toEqual(['groundFactor']);

		expect((await api('/api/sites', { cookie: cookies.sales, method: 'POST', body: '{"name":' })).status).toBe(400);
		expect((await api('/api/sites/4294967295', { cookie: cookies.sales })).status).toBe(404);
		expect((await api('/api/sites/4294967295', { cookie: cookies.sales, method: 'PATCH', body: { allowanceDb: 1 } })).status).toBe(404);
	});
});

describe('POST /api/evaluations with a site', () => {
	const request = {
		targetDb: 98, weighting: 'A', distance: 30, distanceUnit: 'm', programme: 'pop-rock',
		startDate: '2032-09-01', endDate: '2032-09-01'
	};

	it('answers each result’s outcome, limits and receivers for a saved site and for an entered one', async () => {
		const site = (await api('/api/sites', { cookie: cookies.sales, method: 'POST', body: body('Evaluation test park') })).json;
		for (const extra of [{ siteId: site.id }, { site: body('') }]) {
			const result = await api('/api/evaluations', { cookie: cookies.sales, method: 'POST', body: { ...request, ...extra } });
			expect(result.status).toBe(200);
			expect(result.json.site.receivers).toHaveLength(3);
			expect(result.json.results.length).toBeGreaterThan(0);
			for (const r of result.json.results) {
				expect(['clear', 'tight', 'over-limit', 'short']).toContain(r.outcome);
				expect(r.limits).toHaveProperty('ok');
				expect(Array.isArray(r.receivers)).toBe(true);
			}
		}
	});

	it('ranks over the limit after tight and before short', async () => {
		// A boundary limit no package can meet at that distance makes every capable package over the limit.
		const result = await api('/api/evaluations', {
			cookie: cookies.sales,
			method: 'POST',
			body: { ...request, targetDb: 90, siteId: undefined, boundary: { distance: 40, limitDb: 40, weighting: 'A' } }
		});
		const outcomes: string[] = result.json.results.map((r: { outcome: string }) => r.outcome);
		const order = ['clear', 'tight', 'over-limit', 'short'];
		expect(outcomes.map((o) => order.indexOf(o))).toEqual([...outcomes.map((o) => order.indexOf(o))].sort((a, b) => a - b));
		expect(outcomes).toContain('over-limit');
		expect(outcomes).not.toContain('clear');
	});

	it('refuses an unknown site, a receiver without a limit and G outside 0–1 with field errors', async () => {
		const unknown = await api('/api/evaluations', { cookie: cookies.sales, method: 'POST', body: { ...request, siteId: 4294967295 } });
		expect(unknown.status).toBe(422);
		expect(Object.keys(unknown.json.errors)).toEqual(['siteId']);

		const noLimit = body('');
		delete (noLimit.receivers[1] as { limitDb?: number }).limitDb;
		const bad = await api('/api/evaluations', { cookie: cookies.sales, method: 'POST', body: { ...request, site: noLimit } });
		expect(bad.status).toBe(422);
		expect(Object.keys(bad.json.errors)).toEqual(['site.receivers.1.limitDb']);

		const g = await api('/api/evaluations', { cookie: cookies.sales, method: 'POST', body: { ...request, site: { ...body(''), ground: 'custom', groundFactor: -0.5 } } });
		expect(g.status).toBe(422);
		expect(Object.keys(g.json.errors)).toEqual(['site.groundFactor']);

		const both = await api('/api/evaluations', { cookie: cookies.sales, method: 'POST', body: { ...request, siteId: 1, site: body('') } });
		expect(both.status).toBe(422);
	});
});

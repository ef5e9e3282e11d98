/**
 * The composer's API: a system evaluated inline with POST /api/evaluations (422 with field paths on
 * bad groups), and promote — a quote's system saved as a package (warehouse yes, sales no, 409 on a
 * name in use). Model ids and counts are read from the running app, never assumed.
 */
import { randomUUID } from 'node:crypto';
import { beforeAll, describe, expect, it } from 'vitest';
import { api, sessionCookie } from './http';
import { SALES, WAREHOUSE } from '../helpers/demo-accounts';

const request = {
	targetDb: 92, weighting: 'A', distance: 20, distanceUnit: 'm', programme: 'speech',
	startDate: '2034-05-06', endDate: '2034-05-07'
};

interface Group { loudspeakerModelId: number; count: number; stacks: number; amplifierModelId: number; cabinetsPerChannel: number }
let sales = '';
let warehouse = '';
let group: Group;
let clientId = 0;

beforeAll(async () => {
	[sales, warehouse] = await Promise.all([sessionCookie(SALES), sessionCookie(WAREHOUSE)]);
	const packages = (await api('/api/packages', { cookie: sales })).json as { active: boolean; groups: Group[] }[];
	const g = packages.find((p) => p.active)!.groups[0];
	group = { loudspeakerModelId: g.loudspeakerModelId, count: g.count, stacks: g.stacks, amplifierModelId: g.amplifierModelId, cabinetsPerChannel: g.cabinetsPerChannel };
	clientId = (await api('/api/clients', { cookie: sales })).json[0].id;
});

const evaluate = (system: unknown) => api('/api/evaluations', { cookie: sales, method: 'POST', body: { ...request, system } });

describe('POST /api/evaluations with an inline system', () => {
	it('evaluates and prices that system alone', async () => {
		const response = await evaluate({ groups: [group] });
		expect(response.status).toBe(200);
		expect(response.json.results).toHaveLength(1);
		const [result] = response.json.results;
		expect(result.packageName).toContain(' × ');
		expect(result.price.totalMinor).toBeGreaterThan(0);
		expect(['clear', 'tight', 'over-limit', 'short']).toContain(result.outcome);
	});

	it('one more cabinet a stack costs more and never less headroom', async () => {
		const [base, more] = await Promise.all([evaluate({ groups: [group] }), evaluate({ groups: [{ ...group, count: group.count + 1 }] })]);
		expect(more.json.results[0].price.totalMinor).toBeGreaterThan(base.json.results[0].price.totalMinor);
		expect(more.json.results[0].headroomDb).toBeGreaterThanOrEqual(base.json.results[0].headroomDb);
	});

	const badGroups: [string, () => unknown[], string][] = [
		['a count of 0', () => [{ ...group, count: 0 }], 'system.groups.0.count'],
		['no groups', () => [], 'system.groups'],
		['seven groups', () => Array.from({ length: 7 }, () => group), 'system.groups'],
		['more cabinets per channel than the stack has', () => [{ ...group, count: 1, cabinetsPerChannel: 2 }], 'system.groups.0.cabinetsPerChannel'],
		['an unknown loudspeaker model', () => [{ ...group, loudspeakerModelId: 99_999_999 }], 'system.groups.0.loudspeakerModelId'],
		['a negative height', () => [{ ...group, heightM: -1 }], 'system.groups.0.heightM']
	];
	it.each(badGroups)('refuses %s with 422 on its field', async (_what, groups, path) => {
		const response = await evaluate({ groups: groups() });
		expect(response.status).toBe(422);
		expect(response.json.errors[path]).toEqual([expect.any(String)]);
	});

	it('refuses a channel load below the amplifier’s minimum (the package rule) with 422 on cabinetsPerChannel', async () => {
		// Eight cabinets of at most 8 Ω in parallel are at most 1 Ω: below any amplifier's minimum load.
		const loudspeakers = (await api('/api/loudspeakers', { cookie: sales })).json as { id: number; impedanceOhm: number }[];
		const low = loudspeakers.find((l) => l.impedanceOhm <= 8)!;
		const response = await evaluate({ groups: [{ ...group, loudspeakerModelId: low.id, count: 8, cabinetsPerChannel: 8 }] });
		expect(response.status).toBe(422);
		expect(response.json.errors['system.groups.0.cabinetsPerChannel'][0]).toMatch(/below the .* minimum/);
	});

	it('refuses a system that is not an object of groups (422, not 500)', async () => {
		for (const system of ['a lot', [group], { groups: 'many' }, { groups: [{ ...group, stacks: 'two' }] }]) {
			const response = await evaluate(system);
			expect(response.status).toBe(422);
		}
	});
});

describe('promote: POST /api/quotes/:id/package', () => {
	let quoteId = 0;
	const name = `Promoted ${randomUUID().slice(0, 8)}`;

	beforeAll(async () => {
		const created = await api('/api/quotes', { cookie: sales, method: 'POST', body: { clientId, eventName: 'Composed for promotion', system: { groups: [group] }, request } });
		expect(created.status).toBe(201);
		quoteId = created.json.id;
	});

	it('is refused to sales (403) and to nobody signed in (401)', async () => {
		expect((await api(`/api/quotes/${quoteId}/package`, { cookie: sales, method: 'POST', body: { name } })).status).toBe(403);
		expect((await api(`/api/quotes/${quoteId}/package`, { method: 'POST', body: { name } })).status).toBe(401);
	});

	it('creates a package with the system’s groups for the warehouse (201), then 409 for the same name', async () => {
		const created = await api(`/api/quotes/${quoteId}/package`, { cookie: warehouse, method: 'POST', body: { name } });
		expect(created.status).toBe(201);
		expect(created.json.name).toBe(name);
		expect(created.json.groups).toEqual([expect.objectContaining(group)]);
		const again = await api(`/api/quotes/${quoteId}/package`, { cookie: warehouse, method: 'POST', body: { name: name.toLowerCase() } });
		expect(again.status).toBe(409);
		expect(again.json.errors.name).toEqual(['Another package already has this name']);
	});

	it('answers 422 for a missing name, 404 for an unknown quote', async () => {
		const missing = await api(`/api/quotes/${quoteId}/package`, { cookie: warehouse, method: 'POST', body: { name: '' } });
		expect(missing.status).toBe(422);
		expect(missing.json.errors.name).toBeDefined();
		expect((await api('/api/quotes/99999999/package', { cookie: warehouse, method: 'POST', body: { name: `${name} 2` } })).status).toBe(404);
	});
});

import { beforeAll, describe, expect, it } from 'vitest';
import { BASE_URL } from './browser';
import { api, sessionCookie } from './http';
import { amplifierBody, loudspeakerBody, makeFixtures, visit } from './inventory-helpers';

type Who = 'signedOut' | 'client' | 'sales' | 'warehouse' | 'admin';
const cookies: Partial<Record<Who, string>> = {};
let ids: Awaited<ReturnType<typeof makeFixtures>>;

beforeAll(async () => {
	for (const role of ['admin', 'warehouse', 'sales'] as const) cookies[role] = await sessionCookie(`${role}@kestrel-yard.test`);
	cookies.client = await sessionCookie('organiser@millbrook-riverside.test');
	ids = await makeFixtures(cookies.admin!);
});

const readers: Who[] = ['sales', 'warehouse', 'admin'];
const editors: Who[] = ['warehouse', 'admin'];

/** Expected status per person: signed out goes to sign-in (pages) or gets 401 (API). */
function expected(who: Who, allowed: Who[], ok: number, api: boolean): number {
	if (who === 'signedOut') return api ? 401 : 303;
	return allowed.includes(who) ? ok : 403;
}

const everyone: Who[] = ['signedOut', 'client', 'sales', 'warehouse', 'admin'];

describe('inventory pages by role', () => {
	const pages = (): [string, Who[]][] => [
		['/inventory/loudspeakers', readers],
		[`/inventory/loudspeakers/${ids.speakerId}`, readers],
		['/inventory/loudspeakers/new', editors],
		[`/inventory/loudspeakers/${ids.speakerId}/edit`, editors],
		['/inventory/amplifiers', readers],
		[`/inventory/amplifiers/${ids.ampId}`, readers],
		['/inventory/amplifiers/new', editors],
		[`/inventory/amplifiers/${ids.ampId}/edit`, editors],
		['/inventory/packages', readers],
		[`/inventory/packages/${ids.packageId}`, readers],
		['/inventory/packages/new', editors],
		[`/inventory/packages/${ids.packageId}/edit`, editors],
		['/inventory/units', readers],
		[`/inventory/units/${ids.unitId}`, readers],
		['/inventory/units/new', editors],
		['/inventory/import', editors]
	];

	it('every page answers each role as it should', async () => {
		const wrong: string[] = [];
		for (const [path, allowed] of pages()) {
			for (const who of everyone) {
				const { status, location } = await visit(path, { cookie: cookies[who] });
				const want = expected(who, allowed, 200, false);
				if (status !== want) wrong.push(`${who} ${path}: ${status} (wanted ${want})`);
				if (who === 'signedOut' && !location?.startsWith('/signin')) wrong.push(`${path}: signed out went to ${location}`);
			}
		}
		expect(wrong).toEqual([]);
	});

	it('form actions refuse sales (403) and change nothing', async () => {
		const actions = [
			`/inventory/loudspeakers/${ids.speakerId}?/delete`,
			`/inventory/loudspeakers/${ids.speakerId}?/removeAttachment`,
			`/inventory/amplifiers/${ids.ampId}?/delete`,
			`/inventory/packages/${ids.packageId}?/delete`,
			`/inventory/units/${ids.unitId}?/delete`,
			`/inventory/units/${ids.unitId}?/save`,
			`/inventory/loudspeakers/${ids.speakerId}/edit`,
			'/inventory/loudspeakers/new',
			'/inventory/import?/apply'
		];
		for (const path of actions) {
			expect({ path, status: (await visit(path, { cookie: cookies.sales, method: 'POST', form: { attachmentId: '1', kind: 'loudspeakers', csv: 'x' } })).status }).toEqual({ path, status: 403 });
			expect({ path, status: (await visit(path, { cookie: cookies.client, method: 'POST', form: {} })).status }).toEqual({ path, status: 403 });
		}
		expect((await api(`/api/loudspeakers/${ids.speakerId}`, { cookie: cookies.sales })).status).toBe(200);
	});

	it('shows sales no edit buttons', async () => {
		const response = await fetch(`${BASE_URL}/inventory/loudspeakers/${ids.speakerId}`, { headers: { cookie: cookies.sales!, accept: 'text/html' } });
		const html = await response.text();
		expect(html).not.toContain('Edit specification');
		expect(html).not.toContain('?/upload');
	});
});

describe('inventory API by role', () => {
	const reads = () => [
		'/api/loudspeakers',
		`/api/loudspeakers/${ids.speakerId}`,
		`/api/loudspeakers/${ids.speakerId}/history`,
		`/api/loudspeakers/${ids.speakerId}/attachments`,
		'/api/loudspeakers.csv',
		'/api/amplifiers',
		`/api/amplifiers/${ids.ampId}`,
		`/api/amplifiers/${ids.ampId}/history`,
		'/api/amplifiers.csv',
		'/api/packages',
		`/api/packages/${ids.packageId}`,
		`/api/packages/${ids.packageId}/history`,
		'/api/stock-units',
		`/api/stock-units/${ids.unitId}`,
		`/api/stock-units/${ids.unitId}/history`
	];

	it('reads: 401 signed out, 403 client, 200 for staff', async () => {
		const wrong: string[] = [];
		for (const path of reads()) {
			for (const who of everyone) {
				const { status } = await api(path, { cookie: cookies[who] });
				const want = expected(who, readers, 200, true);
				if (status !== want) wrong.push(`${who} GET ${path}: ${status} (wanted ${want})`);
			}
		}
		expect(wrong).toEqual([]);
	});

	it('writes: 401 signed out, 403 client and sales; warehouse and admin allowed', async () => {
		const wrong: string[] = [];
		for (const who of everyone) {
			const cookie = cookies[who];
			const checks: [string, number, number][] = [
				['POST /api/loudspeakers', (await api('/api/loudspeakers', { cookie, method: 'POST', body: loudspeakerBody() })).status, 201],
				['POST /api/amplifiers', (await api('/api/amplifiers', { cookie, method: 'POST', body: amplifierBody() })).status, 201],
				['PATCH loudspeaker', (await api(`/api/loudspeakers/${ids.speakerId}`, { cookie, method: 'PATCH', body: { notes: `touched by ${who}` } })).status, 200],
				['PATCH amplifier', (await api(`/api/amplifiers/${ids.ampId}`, { cookie, method: 'PATCH', body: { notes: `touched by ${who}` } })).status, 200],
				['PATCH package', (await api(`/api/packages/${ids.packageId}`, { cookie, method: 'PATCH', body: { description: `by ${who}` } })).status, 200],
				['PATCH unit', (await api(`/api/stock-units/${ids.unitId}`, { cookie, method: 'PATCH', body: { location: `shelf ${who}` } })).status, 200],
				['import', (await api('/api/amplifiers/import?preview=1', { cookie, method: 'POST', body: {} })).status, 400]
			];
			for (const [label, status, ok] of checks) {
				const want = expected(who, editors, ok, true);
				if (status !== want) wrong.push(`${who} ${label}: ${status} (wanted ${want})`);
			}
		}
		expect(wrong).toEqual([]);
	});

	it('DELETE by sales is 403 and the record stays', async () => {
		expect((await api(`/api/stock-units/${ids.unitId}`, { cookie: cookies.sales, method: 'DELETE' })).status).toBe(403);
		expect((await api(`/api/stock-units/${ids.unitId}`, { cookie: cookies.sales })).status).toBe(200);
	});
});

/**
 * Gear data for the v2 model over HTTP: a directivity row of the wrong length is a 422 naming the band
 * (never a 500), and the directivity CSV goes out and back in through the API. Test tables, not demo data.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { BASE_URL } from './browser';
import { api, sessionCookie } from './http';
import { loudspeakerBody, makeFixtures } from './inventory-helpers';
import { ADMIN, SALES, WAREHOUSE } from '../helpers/demo-accounts';

const table = { anglesDeg: [0, 90, 180], bandsDb: { '63': [0, 1, 2], '1000': [0, 9, 18] } };
const cookies: Record<string, string> = {};
beforeAll(async () => {
	cookies.warehouse = await sessionCookie(WAREHOUSE);
	cookies.admin = await sessionCookie(ADMIN);
	cookies.sales = await sessionCookie(SALES);
});

async function postCsv(path: string, text: string, cookie: string) {
	const response = await fetch(`${BASE_URL}${path}`, { method: 'POST', headers: { cookie, origin: BASE_URL, accept: 'application/json', 'content-type': 'text/csv' }, body: text });
	return { status: response.status, json: await response.json() };
}

describe('gear data API', () => {
	it('a directivity row of the wrong length is 422 with a field message naming the band', async () => {
		const bad = await api('/api/loudspeakers', {
			cookie: cookies.warehouse,
			method: 'POST',
			body: loudspeakerBody({ directivity: { ...table, bandsDb: { ...table.bandsDb, '125': [0, 4] } }, compressionDb: -1, bandResponseDb: { '20': -3 } })
		});
		expect(bad.status).toBe(422);
		expect(bad.json.errors['directivity.bandsDb.125']).toEqual([expect.stringMatching(/^125 Hz: 2 values for 3 angles/)]);
		expect(Object.keys(bad.json.errors).sort()).toEqual(['bandResponseDb', 'compressionDb', 'directivity.bandsDb.125']);
	});

	it('a package group with a bad pattern or a negative height is 422 per field', async () => {
		const ids = await makeFixtures(cookies.admin);
		const patched = await api(`/api/packages/${ids.packageId}`, {
			cookie: cookies.warehouse,
			method: 'PATCH',
			body: { groups: [{ loudspeakerModelId: ids.speakerId, amplifierModelId: ids.ampId, count: 2, stacks: 2, cabinetsPerChannel: 1, heightM: -1, directivity: { anglesDeg: [0, 180, 90], bandsDb: { '63': [0, 1, 2] } } }] }
		});
		expect(patched.status).toBe(422);
		expect(Object.keys(patched.json.errors).sort()).toEqual(['groups.0.directivity.anglesDeg', 'groups.0.heightM']);
		const placed = await api(`/api/packages/${ids.packageId}`, {
			cookie: cookies.warehouse,
			method: 'PATCH',
			body: { groups: [{ loudspeakerModelId: ids.speakerId, amplifierModelId: ids.ampId, count: 2, stacks: 2, cabinetsPerChannel: 1, heightM: 2.5, spacingM: 9, directivity: table }] }
		});
		expect(placed).toMatchObject({ status: 200, json: { groups: [{ heightM: 2.5, spacingM: 9, directivity: table }] } });
	});

	it('directivity CSV: export, a bad file refused per row and column with nothing changed, a good one imported', async () => {
		const created = await api('/api/loudspeakers', { cookie: cookies.warehouse, method: 'POST', body: loudspeakerBody({ directivity: table, compressionDb: 1.5 }) });
		expect(created).toMatchObject({ status: 201, json: { directivity: table, compressionDb: 1.5 } });
		const id = created.json.id;
		const exported = await fetch(`${BASE_URL}/api/loudspeakers/${id}/directivity.csv`, { headers: { cookie: cookies.sales } });
		expect(exported.headers.get('content-type')).toMatch(/^text\/csv/);
		const text = await exported.text();
		expect(text).toBe('band_hz,0,90,180\r\n63,0,1,2\r\n1000,0,9,18\r\n');

		const preview = await postCsv(`/api/loudspeakers/${id}/directivity.csv?preview=1`, 'band_hz,0,90,180\r\n63,0,1\r\n', cookies.warehouse);
		expect(preview).toMatchObject({ status: 200, json: { valid: false, rows: [{ row: 1, errors: { values: [expect.stringMatching(/^63 Hz/)] } }] } });
		const refused = await postCsv(`/api/loudspeakers/${id}/directivity.csv`, 'band_hz,0,90,180\r\n63,0,1,2\r\n125,0,-3,2\r\n', cookies.warehouse);
		expect(refused).toMatchObject({ status: 422, json: { errors: { '2.90': [expect.any(String)] } } });
		expect((await api(`/api/loudspeakers/${id}`, { cookie: cookies.sales })).json.directivity).toEqual(table);

		const imported = await postCsv(`/api/loudspeakers/${id}/directivity.csv`, text.replace('1000,0,9,18', '1000,0,10,18'), cookies.warehouse);
		expect(imported).toMatchObject({ status: 200, json: { changed: true } });
		const history = await api(`/api/loudspeakers/${id}/history`, { cookie: cookies.sales });
		expect(history.json[0]).toMatchObject({ field: 'directivity', userName: 'Sam Ilunga' });
		expect(JSON.parse(history.json[0].newValue).bandsDb['1000']).toEqual([0, 10, 18]);
		expect((await postCsv(`/api/loudspeakers/${id}/directivity.csv`, text, cookies.sales)).status).toBe(403);
	});
});

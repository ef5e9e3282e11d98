import { beforeAll, describe, expect, it } from 'vitest';
import { BASE_URL } from './browser';
import { api, sessionCookie } from './http';
import { amplifierBody, loudspeakerBody, makeFixtures, tag } from './inventory-helpers';
import { AMPLIFIER_CSV_COLUMNS } from '../../src/lib/inventory/csv';
import { ADMIN, SALES, WAREHOUSE } from '../helpers/demo-accounts';

const cookies: Record<string, string> = {};
beforeAll(async () => {
	cookies.warehouse = await sessionCookie(WAREHOUSE);
	cookies.admin = await sessionCookie(ADMIN);
	cookies.sales = await sessionCookie(SALES);
});

async function send(path: string, body: BodyInit, contentType: string | null, cookie = cookies.warehouse) {
	const response = await fetch(`${BASE_URL}${path}`, {
		method: 'POST',
		headers: { cookie, origin: BASE_URL, accept: 'application/json', ...(contentType ? { 'content-type': contentType } : {}) },
		body
	});
	return { status: response.status, json: await response.json() };
}

describe('loudspeaker and amplifier API', () => {
	it('bad input is 422 with a message per field; broken JSON is 400', async () => {
		const bad = await api('/api/loudspeakers', {
			cookie: cookies.warehouse,
			method: 'POST',
			body: loudspeakerBody({ sensitivityDb: 9.6, impedanceOhm: 0, kind: 'horn', dispersionHDeg: 400, weightKg: -1, dayRateMinor: 12.5 })
		});
		expect(bad.status).toBe(422);
		expect(Object.keys(bad.json.errors).sort()).toEqual(['dayRateMinor', 'dispersionHDeg', 'impedanceOhm', 'kind', 'sensitivityDb', 'weightKg']);
		expect(bad.json.message).toBeTruthy();
		const crossField = await api('/api/loudspeakers', { cookie: cookies.warehouse, method: 'POST', body: loudspeakerBody({ kind: 'line-array-element' }) });
		expect(crossField).toMatchObject({ status: 422, json: { errors: { heightM: [expect.any(String)] } } });
		const amp = await api('/api/amplifiers', { cookie: cookies.warehouse, method: 'POST', body: amplifierBody({ channels: 0, mainsCurrentAmps: 'lots' }) });
		expect(Object.keys(amp.json.errors).sort()).toEqual(['channels', 'mainsCurrentAmps']);
		expect((await api('/api/loudspeakers', { cookie: cookies.warehouse, method: 'POST', body: '{"name":' })).status).toBe(400);
	});

	it('POST 201 with id → PATCH 200 → history shows who and old → new', async () => {
		const created = await api('/api/loudspeakers', { cookie: cookies.warehouse, method: 'POST', body: loudspeakerBody({ sensitivityDb: 95 }) });
		expect(created.status).toBe(201);
		expect(created.json).toMatchObject({ id: expect.any(Number), sensitivityDb: 95, powerPeakW: null });
		const patched = await api(`/api/loudspeakers/${created.json.id}`, { cookie: cookies.warehouse, method: 'PATCH', body: { sensitivityDb: 97.5 } });
		expect(patched).toMatchObject({ status: 200, json: { sensitivityDb: 97.5 } });
		const history = await api(`/api/loudspeakers/${created.json.id}/history`, { cookie: cookies.sales });
		expect(history.json[0]).toMatchObject({ field: 'sensitivityDb', oldValue: '95', newValue: '97.5', userName: 'Sam Ilunga' });
		const mergedBreak = await api(`/api/loudspeakers/${created.json.id}`, { cookie: cookies.warehouse, method: 'PATCH', body: { lowHz: 900, highHz: 800 } });
		expect(mergedBreak).toMatchObject({ status: 422, json: { errors: { highHz: expect.any(Array) } } });
		const unknownField = await api(`/api/loudspeakers/${created.json.id}`, { cookie: cookies.warehouse, method: 'PATCH', body: { colour: 'red' } });
		expect(unknownField.status).toBe(422);
	});

	it('unknown ids are 404; delete is 409 while used and 204 once free', async () => {
		expect((await api('/api/loudspeakers/999999999', { cookie: cookies.sales })).status).toBe(404);
		expect((await api('/api/amplifiers/999999999/history', { cookie: cookies.sales })).status).toBe(404);
		expect((await api('/api/packages/999999999', { cookie: cookies.warehouse, method: 'PATCH', body: { name: 'X' } })).status).toBe(404);
		const ids = await makeFixtures(cookies.admin);
		expect((await api(`/api/loudspeakers/${ids.speakerId}`, { cookie: cookies.warehouse, method: 'DELETE' })).status).toBe(409);
		expect((await api(`/api/amplifiers/${ids.ampId}`, { cookie: cookies.warehouse, method: 'DELETE' })).status).toBe(409);
		expect((await api(`/api/stock-units/${ids.unitId}`, { cookie: cookies.warehouse, method: 'DELETE' })).status).toBe(204);
		expect((await api(`/api/packages/${ids.packageId}`, { cookie: cookies.warehouse, method: 'DELETE' })).status).toBe(204);
		expect((await api(`/api/loudspeakers/${ids.speakerId}`, { cookie: cookies.warehouse, method: 'DELETE' })).status).toBe(204);
		expect((await api(`/api/loudspeakers/${ids.speakerId}`, { cookie: cookies.warehouse })).status).toBe(404);
	});

	it('a package whose channel load falls below the amplifier minimum is 422 on that group field', async () => {
		const speaker = await api('/api/loudspeakers', { cookie: cookies.warehouse, method: 'POST', body: loudspeakerBody({ impedanceOhm: 4 }) });
		const amp = await api('/api/amplifiers', { cookie: cookies.warehouse, method: 'POST', body: amplifierBody({ minLoadOhm: 4, powerW2: null }) });
		const result = await api('/api/packages', {
			cookie: cookies.warehouse,
			method: 'POST',
			body: { name: `Kit ${tag()}`, slug: `kit-${tag()}`, groups: [{ loudspeakerModelId: speaker.json.id, amplifierModelId: amp.json.id, count: 2, cabinetsPerChannel: 2 }] }
		});
		expect(result).toMatchObject({ status: 422, json: { errors: { 'groups.0.cabinetsPerChannel': [expect.stringMatching(/below/)] } } });
	});
});

describe('CSV over HTTP', () => {
	it('export → import round-trips identically for both lists', async () => {
		for (const list of ['loudspeakers', 'amplifiers']) {
			const response = await fetch(`${BASE_URL}/api/${list}.csv`, { headers: { cookie: cookies.sales } });
			expect(response.headers.get('content-type')).toMatch(/^text\/csv/);
			expect(response.headers.get('content-disposition')).toMatch(/^attachment; filename="/);
			const exported = await response.text();
			expect(exported.split('\r\n')[0].split(',')).toEqual(expect.arrayContaining(['Name', 'Weight (kg)', 'Day rate (GBP)']));
			expect(exported.split('\r\n')[0]).not.toMatch(/dayRateMinor/);
			const imported = await send(`/api/${list}/import`, exported, 'text/csv');
			expect(imported.status).toBe(200);
			expect(imported.json.created + imported.json.updated).toBe(0);
			expect(imported.json.unchanged).toBe(exported.trim().split('\r\n').length - 1);
			const again = await (await fetch(`${BASE_URL}/api/${list}.csv`, { headers: { cookie: cookies.sales } })).text();
			expect(again).toBe(exported);
		}
	});

	it('multipart import previews, then applies; one bad row imports nothing (422 per row and field)', async () => {
		const exported = await (await fetch(`${BASE_URL}/api/amplifiers.csv`, { headers: { cookie: cookies.warehouse } })).text();
		const header = exported.split('\r\n')[0];
		const name = `Csv amp ${tag()}`;
		const good = `${name},CSV Maker,2,700,1200,,4,1,9,18.00,900.00,2.5,`;
		const bad = `Other ${tag()},CSV Maker,0,700,1200,,4,1,9,18.00,900.00,2.5,`;
		const form = (text: string) => {
			const data = new FormData();
			data.set('file', new Blob([text], { type: 'text/csv' }), 'amps.csv');
			return data;
		};
		const preview = await send('/api/amplifiers/import?preview=1', form(`${header}\r\n${good}\r\n${bad}\r\n`), null);
		// Rows by the spreadsheet's own numbers: the header is row 1.
		expect(preview.json.rows.map((r: { row: number; action: string }) => [r.row, r.action])).toEqual([[2, 'create'], [3, 'invalid']]);
		const refused = await send('/api/amplifiers/import', form(`${header}\r\n${good}\r\n${bad}\r\n`), null);
		expect(refused).toMatchObject({ status: 422, json: { errors: { '3.channels': expect.any(Array) } } });
		const list = await api('/api/amplifiers', { cookie: cookies.warehouse });
		expect(list.json.some((a: { name: string }) => a.name === name)).toBe(false);
		const applied = await send('/api/amplifiers/import', form(`${header}\r\n${good}\r\n`), null);
		expect(applied).toMatchObject({ status: 200, json: { created: 1, updated: 0 } });
		const made = (await api('/api/amplifiers', { cookie: cookies.warehouse })).json.find((a: { name: string }) => a.name === name);
		expect(made).toMatchObject({ dayRateMinor: 1800, replacementValueMinor: 90000 });
	});

	it('still imports a file with the old field-name headers (money in minor units), and previews old → new', async () => {
		const name = `Old csv amp ${tag()}`;
		const old = (dayRate: number) => `${AMPLIFIER_CSV_COLUMNS.join(',')}\r\n${name},CSV Maker,2,700,1200,,4,1,9,${dayRate},90000,2.5,\r\n`;
		expect(await send('/api/amplifiers/import', old(1800), 'text/csv')).toMatchObject({ status: 200, json: { created: 1 } });
		const preview = await send('/api/amplifiers/import?preview=1', old(2150), 'text/csv');
		expect(preview.json.rows).toEqual([expect.objectContaining({ row: 2, action: 'update', changes: [{ field: 'dayRateMinor', from: '1800', to: '2150' }] })]);
	});

	it('refuses a body over 1 MB and a body that is not CSV', async () => {
		const huge = 'name,maker\r\n' + 'x'.repeat(1024 * 1024 + 10);
		expect((await send('/api/loudspeakers/import', huge, 'text/csv')).status).toBe(413);
		expect((await send('/api/loudspeakers/import', '{}', 'application/json')).status).toBe(400);
	});
});

describe('attachments over HTTP', () => {
	const upload = (path: string, kind: string, bytes: Uint8Array<ArrayBuffer>, name: string, cookie = cookies.warehouse) => {
		const data = new FormData();
		data.set('kind', kind);
		data.set('file', new Blob([bytes]), name);
		return send(path, data, null, cookie);
	};
	const pdfBytes = new Uint8Array(new TextEncoder().encode('%PDF-1.4\n% test sheet\n'));

	it('stores a PDF and serves it to staff only, with its type and a safe content-disposition', async () => {
		const speaker = await api('/api/loudspeakers', { cookie: cookies.warehouse, method: 'POST', body: loudspeakerBody() });
		const stored = await upload(`/api/loudspeakers/${speaker.json.id}/attachments`, 'spec-sheet', pdfBytes, '../../etc/spec "sheet".pdf');
		expect(stored).toMatchObject({ status: 201, json: { kind: 'spec-sheet', mimeType: 'application/pdf', originalName: 'spec sheet.pdf' } });
		const served = await fetch(`${BASE_URL}/api/attachments/${stored.json.id}`, { headers: { cookie: cookies.sales } });
		expect(served.status).toBe(200);
		expect(served.headers.get('content-type')).toBe('application/pdf');
		expect(served.headers.get('content-disposition')).toBe(`attachment; filename="spec sheet.pdf"; filename*=UTF-8''spec%20sheet.pdf`);
		expect(new Uint8Array(await served.arrayBuffer())).toEqual(pdfBytes);
		expect((await fetch(`${BASE_URL}/api/attachments/${stored.json.id}`)).status).toBe(401);
		const client = await sessionCookie('organiser@millbrook-riverside.test');
		expect((await fetch(`${BASE_URL}/api/attachments/${stored.json.id}`, { headers: { cookie: client } })).status).toBe(403);
	});

	it('refuses a renamed executable and a wrong kind (422 on file); sales may not upload (403)', async () => {
		const speaker = await api('/api/loudspeakers', { cookie: cookies.warehouse, method: 'POST', body: loudspeakerBody() });
		const path = `/api/loudspeakers/${speaker.json.id}/attachments`;
		const exe = new Uint8Array([0x4d, 0x5a, 0x90, 0x00, 0x03]);
		expect(await upload(path, 'photo', exe, 'photo.jpg')).toMatchObject({ status: 422, json: { errors: { file: expect.any(Array) } } });
		expect(await upload(path, 'spec-sheet', exe, 'sheet.pdf')).toMatchObject({ status: 422 });
		expect((await upload(path, 'manual', pdfBytes, 'a.pdf')).status).toBe(422);
		expect((await upload(path, 'spec-sheet', pdfBytes, 'a.pdf', cookies.sales)).status).toBe(403);
	});
});

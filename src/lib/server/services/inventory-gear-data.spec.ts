import { describe, expect, it } from 'vitest';
import { useTestDatabase } from '../../../../tests/helpers/db';
import { makeContactUser, makeStaffUser, makeStockedPackage } from '../../../../tests/helpers/inventory';
import { amplifierInput, loudspeakerInput, staffUser, uniqueName } from '../../../../tests/helpers/inventory-inputs';
import { serialiseDirectivityCsv } from '$lib/inventory/directivity-csv';
import { toLoudspeakerSpec } from '$lib/inventory/to-spec';
import { amplifiers } from './inventory-amplifiers';
import { applyDirectivityImport, exportDirectivityCsv } from './inventory-directivity';
import { exportModelsCsv, applyImport } from './inventory-csv';
import { listHistory } from './inventory-history';
import { loudspeakers } from './inventory-loudspeakers';
import { createPackage, getLoadedPackage, getPackage, updatePackage } from './inventory-packages';
import { createQuote, getQuote } from './quotes';

useTestDatabase();

// Test tables and figures, not demo data.
const table = { anglesDeg: [0, 60, 120, 180], bandsDb: { '31.5': [0, 0.5, 1, 1.5], '63': [0, 1, 2, 3], '2000': [0, 5, 14, 20] } };
const cardioid = { anglesDeg: [0, 90, 180], bandsDb: { '63': [0, 6, 18], '125': [0, 6, 15] } };
const request = {
	targetDb: 90, weighting: 'A' as const, distance: 10, distanceUnit: 'm' as const, programme: 'speech',
	temperatureC: 20, humidityPct: 50, startDate: '2031-06-10', endDate: '2031-06-11'
};

describe('loudspeaker gear data (band response, compression, directivity)', () => {
	it('stores and returns them as given, with "31.5" and every band in place', async () => {
		const row = await loudspeakers.create(loudspeakerInput({ bandResponseDb: { '31.5': -20, '63': -3, '125': 0 }, compressionDb: 1.5, directivity: table }), null);
		const fetched = await loudspeakers.get(row.id);
		expect(fetched.bandResponseDb).toEqual({ '31.5': -20, '63': -3, '125': 0 });
		expect(fetched.compressionDb).toBe(1.5);
		expect(fetched.directivity).toEqual(table);
		expect(toLoudspeakerSpec(fetched).directivity?.bandsDb[31.5]).toEqual([0, 0.5, 1, 1.5]);
	});

	it('history records old → new as JSON; an unchanged table written again records nothing', async () => {
		const tech = await staffUser();
		const row = await loudspeakers.create(loudspeakerInput({ directivity: table, compressionDb: 1 }), tech.id);
		// Same table, keys in another order: not a change.
		const reordered = { bandsDb: { '2000': table.bandsDb['2000'], '63': table.bandsDb['63'], '31.5': table.bandsDb['31.5'] }, anglesDeg: table.anglesDeg };
		expect((await loudspeakers.update(row.id, { directivity: reordered }, tech.id)).changed).toEqual([]);
		const edited = { ...table, bandsDb: { ...table.bandsDb, '2000': [0, 6, 14, 20] } };
		const { changed } = await loudspeakers.update(row.id, { directivity: edited, compressionDb: 2, bandResponseDb: { '63': -4 } }, tech.id);
		expect(changed.sort()).toEqual(['bandResponseDb', 'compressionDb', 'directivity']);
		const byField = Object.fromEntries((await listHistory('loudspeaker', row.id)).map((h) => [h.field, h]));
		expect(JSON.parse(byField.directivity.oldValue!)).toEqual(table);
		expect(JSON.parse(byField.directivity.newValue!).bandsDb['2000']).toEqual([0, 6, 14, 20]);
		expect(byField.compressionDb).toMatchObject({ oldValue: '1', newValue: '2', userId: tech.id });
		expect(byField.bandResponseDb).toMatchObject({ oldValue: null, newValue: '{"63":-4}' });
	});

	it('a table change flags the open quotes that use the model for re-check', async () => {
		const { pkg, loudspeaker } = await makeStockedPackage();
		const desk = await makeStaffUser();
		const { client } = await makeContactUser();
		const quote = await createQuote({ clientId: client.id, eventName: 'Fixture event', packageId: pkg.id, request }, desk);
		expect((await getQuote(quote.id, desk)).needsRecheck).toBe(false);
		await loudspeakers.update(loudspeaker.id, { directivity: table }, null);
		expect((await getQuote(quote.id, desk)).needsRecheck).toBe(true);
	});

	it('a wrong row length is a 422 naming the band, and changes nothing', async () => {
		const row = await loudspeakers.create(loudspeakerInput(), null);
		await expect(loudspeakers.update(row.id, { directivity: { ...table, bandsDb: { '125': [0, 1] } } }, null)).rejects.toMatchObject({
			status: 422,
			errors: { 'directivity.bandsDb.125': [expect.stringMatching(/^125 Hz: 2 values for 4 angles/)] }
		});
		expect((await loudspeakers.get(row.id)).directivity).toBeNull();
	});

	it('the models CSV round-trips band response and compression; the directivity CSV round-trips the table', async () => {
		const input = loudspeakerInput({ name: uniqueName('Csv cab'), bandResponseDb: { '31.5': -24, '63': -6.5 }, compressionDb: 2.5, directivity: table });
		const row = await loudspeakers.create(input, null);
		const exported = await exportModelsCsv('loudspeakers');
		const line = exported.split('\r\n').find((l) => l.startsWith(input.name))!;
		await loudspeakers.update(row.id, { bandResponseDb: null, compressionDb: null }, null);
		const header = exported.split('\r\n')[0];
		expect(await applyImport('loudspeakers', `${header}\r\n${line}\r\n`, null)).toMatchObject({ updated: 1 });
		const back = await loudspeakers.get(row.id);
		expect(back.bandResponseDb).toEqual({ '31.5': -24, '63': -6.5 });
		expect(back.compressionDb).toBe(2.5);
		expect(back.directivity).toEqual(table); // the models CSV leaves the table alone

		const { text } = await exportDirectivityCsv(row.id);
		expect(text).toBe(serialiseDirectivityCsv(table));
		await loudspeakers.update(row.id, { directivity: null }, null);
		expect(await applyDirectivityImport(row.id, text, null)).toMatchObject({ changed: true });
		expect((await loudspeakers.get(row.id)).directivity).toEqual(table);
		const history = await listHistory('loudspeaker', row.id);
		expect(history[0]).toMatchObject({ field: 'directivity', oldValue: null });
	});

	it('a directivity CSV with a bad row imports nothing (422 per row and column)', async () => {
		const row = await loudspeakers.create(loudspeakerInput({ directivity: table }), null);
		await expect(applyDirectivityImport(row.id, 'band_hz,0,90,180\r\n63,0,1,2\r\n125,0,-1,2\r\n', null)).rejects.toMatchObject({
			status: 422,
			errors: { '2.90': [expect.stringMatching(/0 dB or more/)] }
		});
		expect((await loudspeakers.get(row.id)).directivity).toEqual(table);
	});
});

describe('package group placement (height, spacing, own pattern)', () => {
	async function models() {
		const sub = await loudspeakers.create(loudspeakerInput({ kind: 'subwoofer', lowHz: 35, highHz: 120, dispersionHDeg: 360, dispersionVDeg: 360, impedanceOhm: 8 }), null);
		const amp = await amplifiers.create(amplifierInput({ channels: 2, minLoadOhm: 4, powerW2: null }), null);
		return { sub, amp };
	}

	it('stores height, spacing and pattern, records them in history and re-checks open quotes of the package', async () => {
		const { sub, amp } = await models();
		const group = { loudspeakerModelId: sub.id, amplifierModelId: amp.id, count: 2, stacks: 2, cabinetsPerChannel: 1, flown: false };
		const slug = uniqueName('pkg').toLowerCase().replace(/\s+/g, '-');
		const created = await createPackage({ name: uniqueName('Kit'), slug, description: '', active: true, groups: [{ ...group, heightM: 0.6, spacingM: 10 }] }, null);
		expect(created.groups[0]).toMatchObject({ heightM: 0.6, spacingM: 10, directivity: null });

		const desk = await makeStaffUser();
		const { client } = await makeContactUser();
		const quote = await createQuote({ clientId: client.id, eventName: 'Fixture event', packageId: created.id, request: { ...request, programme: 'pop-rock' } }, desk);
		expect((await getQuote(quote.id, desk)).needsRecheck).toBe(false);

		await updatePackage(created.id, { groups: [{ ...group, heightM: 0.6, spacingM: 12, directivity: cardioid }] }, desk.id);
		const loaded = await getLoadedPackage(created.id);
		expect(loaded.groups[0]).toMatchObject({ spacingM: 12, directivity: cardioid });
		const entry = (await listHistory('package', created.id)).find((h) => h.field === 'groups')!;
		expect(entry.oldValue).toContain('0.6 m high, outer stacks 10 m apart');
		expect(entry.newValue).toContain('outer stacks 12 m apart, own pattern at 0 90 180°; 63 Hz: 0 6 18; 125 Hz: 0 6 15');
		expect((await getQuote(quote.id, desk)).needsRecheck).toBe(true);
		expect((await getPackage(created.id)).groups[0].heightM).toBe(0.6);
	});

	it('refuses a negative height and a pattern row of the wrong length, per field', async () => {
		const { sub, amp } = await models();
		const group = { loudspeakerModelId: sub.id, amplifierModelId: amp.id, count: 2, stacks: 1, cabinetsPerChannel: 1, flown: false };
		const input = { name: uniqueName('Kit'), slug: uniqueName('pkg').toLowerCase().replace(/\s+/g, '-'), description: '', active: true };
		await expect(createPackage({ ...input, groups: [{ ...group, heightM: -0.5, directivity: { anglesDeg: [0, 180], bandsDb: { '63': [0] } } }] }, null)).rejects.toMatchObject({
			status: 422,
			errors: { 'groups.0.heightM': expect.any(Array), 'groups.0.directivity.bandsDb.63': [expect.stringMatching(/^63 Hz/)] }
		});
	});
});

import { describe, expect, it } from 'vitest';
import { loudspeakerSchema } from '$lib/schemas/inventory-loudspeakers';
import { amplifierSchema } from '$lib/schemas/inventory-amplifiers';
import { AMPLIFIER_CSV_COLUMNS, LOUDSPEAKER_CSV_COLUMNS, csvErrorEnvelope, parseModelsCsv, serialiseCsv } from './csv';

const speakers = [
	{ name: 'Plain top', maker: 'Maker, Ltd', kind: 'full-range', sensitivityDb: 97.3, sensitivityRef: '2.83V', impedanceOhm: 8, powerContinuousW: 500, powerPeakW: null, maxSplContinuousDb: 124.5, maxSplPeakDb: null, dispersionHDeg: 90, dispersionVDeg: 50, lowHz: 55, highHz: 19000, heightM: null, weightKg: 0.1, dayRateMinor: 3000, replacementValueMinor: 150000, notes: 'Says "hello",\nover two lines' },
	{ name: '=cmd|calc', maker: "'quoted", kind: 'line-array-element', sensitivityDb: 104, sensitivityRef: '1W', impedanceOhm: 16, powerContinuousW: 1000, powerPeakW: 4000, maxSplContinuousDb: 133, maxSplPeakDb: 139, dispersionHDeg: 90, dispersionVDeg: 10, lowHz: 50, highHz: 18000, heightM: 0.38, weightKg: 62, dayRateMinor: 0, replacementValueMinor: 480000, notes: '-starts with a dash' }
].map((s, i) => ({ ...s, compressionDb: i === 0 ? null : 1.5, bandResponseDb: i === 0 ? null : { '31.5': -18, '63': -3.5, '125': -0.5 } }));

describe('models CSV', () => {
	it('round-trips exactly: serialise → parse gives the same values, and serialising again the same text', () => {
		const text = serialiseCsv(speakers, LOUDSPEAKER_CSV_COLUMNS);
		expect(text.split('\r\n')[0]).toBe(LOUDSPEAKER_CSV_COLUMNS.join(','));
		const parsed = parseModelsCsv(text, LOUDSPEAKER_CSV_COLUMNS, loudspeakerSchema);
		expect(parsed.fileErrors).toEqual([]);
		expect(parsed.rows.map((r) => r.errors)).toEqual([{}, {}]);
		expect(parsed.rows.map((r) => r.data)).toEqual(speakers);
		expect(serialiseCsv(parsed.rows.map((r) => r.data!), LOUDSPEAKER_CSV_COLUMNS)).toBe(text);
	});

	it('carries compression and the band response as one column per band', () => {
		const [header, , second] = serialiseCsv(speakers, LOUDSPEAKER_CSV_COLUMNS).split('\r\n');
		expect(header).toContain('compressionDb,bandResponseDb.31.5,bandResponseDb.63,bandResponseDb.125,bandResponseDb.250');
		expect(second).toContain(',1.5,-18,-3.5,-0.5,,,,,,,');
		const bad = serialiseCsv([{ ...speakers[1], compressionDb: -1, bandResponseDb: { '63': 'loud' } }], LOUDSPEAKER_CSV_COLUMNS);
		expect(Object.keys(parseModelsCsv(bad, LOUDSPEAKER_CSV_COLUMNS, loudspeakerSchema).rows[0].errors).sort()).toEqual(['bandResponseDb.63', 'compressionDb']);
	});

	it('writes a cell a spreadsheet would run as a formula with a leading apostrophe', () => {
		const text = serialiseCsv(speakers, LOUDSPEAKER_CSV_COLUMNS);
		expect(text).toContain("'=cmd|calc");
		expect(text).toContain("''quoted");
		expect(text).toContain("'-starts with a dash");
	});

	it('reports per-row, per-field errors, and duplicates within the file', () => {
		const rows = [{ ...speakers[0], sensitivityDb: 9.7 }, speakers[1], { ...speakers[1], weightKg: 'heavy' }, { ...speakers[1], name: 'Other', heightM: null }];
		const parsed = parseModelsCsv(serialiseCsv(rows, LOUDSPEAKER_CSV_COLUMNS), LOUDSPEAKER_CSV_COLUMNS, loudspeakerSchema);
		expect(parsed.rows.map((r) => Object.keys(r.errors).sort())).toEqual([['sensitivityDb'], [], ['name', 'weightKg'], ['heightM']]);
		expect(parsed.rows[2].errors.weightKg).toEqual(['Enter a number']);
		expect(csvErrorEnvelope(parsed)).toHaveProperty(['1.sensitivityDb']);
		expect(csvErrorEnvelope(parsed)).toHaveProperty(['4.heightM']);
	});

	it('refuses a file with missing or unknown columns, or no rows', () => {
		expect(parseModelsCsv('name,maker,colour\r\na,b,red\r\n', AMPLIFIER_CSV_COLUMNS, amplifierSchema).fileErrors).toEqual([
			expect.stringMatching(/^Missing column\(s\): channels, /),
			'Unknown column(s): colour'
		]);
		expect(parseModelsCsv(AMPLIFIER_CSV_COLUMNS.join(',') + '\r\n', AMPLIFIER_CSV_COLUMNS, amplifierSchema).fileErrors).toEqual(['The file has no rows']);
	});

	it('reads a byte-order mark and blank trailing lines without complaint', () => {
		const text = '\uFEFF' + serialiseCsv([speakers[0]], LOUDSPEAKER_CSV_COLUMNS) + '\r\n\r\n';
		expect(parseModelsCsv(text, LOUDSPEAKER_CSV_COLUMNS, loudspeakerSchema).rows).toHaveLength(1);
	});
});

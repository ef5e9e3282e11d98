import { describe, expect, it } from 'vitest';
import { loudspeakerSchema } from '$lib/schemas/inventory-loudspeakers';
import { amplifierSchema } from '$lib/schemas/inventory-amplifiers';
import { AMPLIFIER_CSV_COLUMNS, LOUDSPEAKER_CSV_COLUMNS, csvErrorEnvelope, csvHeader, parseModelsCsv, serialiseCsv } from './csv';

const speakers = [
	{ name: 'Plain top', maker: 'Maker, Ltd', kind: 'full-range', sensitivityDb: 97.3, sensitivityRef: '2.83V', impedanceOhm: 8, powerContinuousW: 500, powerPeakW: null, maxSplContinuousDb: 124.5, maxSplPeakDb: null, dispersionHDeg: 90, dispersionVDeg: 50, lowHz: 55, highHz: 19000, heightM: null, weightKg: 0.1, dayRateMinor: 3000, replacementValueMinor: 150000, notes: 'Says "hello",\nover two lines' },
	{ name: '=cmd|calc', maker: "'quoted", kind: 'line-array-element', sensitivityDb: 104, sensitivityRef: '1W', impedanceOhm: 16, powerContinuousW: 1000, powerPeakW: 4000, maxSplContinuousDb: 133, maxSplPeakDb: 139, dispersionHDeg: 90, dispersionVDeg: 10, lowHz: 50, highHz: 18000, heightM: 0.38, weightKg: 62, dayRateMinor: 0, replacementValueMinor: 480000, notes: '-starts with a dash' }
].map((s, i) => ({ ...s, compressionDb: i === 0 ? null : 1.5, bandResponseDb: i === 0 ? null : { '31.5': -18, '63': -3.5, '125': -0.5 } }));

describe('models CSV', () => {
	it('round-trips exactly: serialise → parse gives the same values, and serialising again the same text', () => {
		const text = serialiseCsv(speakers, LOUDSPEAKER_CSV_COLUMNS, 'GBP');
		expect(text.split('\r\n')[0]).toBe(LOUDSPEAKER_CSV_COLUMNS.map((c) => csvHeader(c, 'GBP')).map((h) => (h.includes(',') ? `"${h}"` : h)).join(','));
		const parsed = parseModelsCsv(text, LOUDSPEAKER_CSV_COLUMNS, loudspeakerSchema, 'GBP');
		expect(parsed.fileErrors).toEqual([]);
		expect(parsed.rows.map((r) => r.errors)).toEqual([{}, {}]);
		expect(parsed.rows.map((r) => r.data)).toEqual(speakers);
		expect(serialiseCsv(parsed.rows.map((r) => r.data!), LOUDSPEAKER_CSV_COLUMNS, 'GBP')).toBe(text);
	});

	it('carries compression and the band response as one column per band', () => {
		const [header, , second] = serialiseCsv(speakers, LOUDSPEAKER_CSV_COLUMNS, 'GBP').split('\r\n');
		expect(header).toContain('Power compression (dB),"Band response, 31.5 Hz (dB re sensitivity)","Band response, 63 Hz (dB re sensitivity)"');
		expect(second).toContain(',1.5,-18,-3.5,-0.5,,,,,,,');
		const bad = serialiseCsv([{ ...speakers[1], compressionDb: -1, bandResponseDb: { '63': 'loud' } }], LOUDSPEAKER_CSV_COLUMNS, 'GBP');
		expect(Object.keys(parseModelsCsv(bad, LOUDSPEAKER_CSV_COLUMNS, loudspeakerSchema, 'GBP').rows[0].errors).sort()).toEqual(['bandResponseDb.63', 'compressionDb']);
	});

	it('writes a cell a spreadsheet would run as a formula with a leading apostrophe', () => {
		const text = serialiseCsv(speakers, LOUDSPEAKER_CSV_COLUMNS, 'GBP');
		expect(text).toContain("'=cmd|calc");
		expect(text).toContain("''quoted");
		expect(text).toContain("'-starts with a dash");
	});

	it('reports per-row, per-field errors, and duplicates within the file', () => {
		const rows = [{ ...speakers[0], sensitivityDb: 9.7 }, speakers[1], { ...speakers[1], weightKg: 'heavy' }, { ...speakers[1], name: 'Other', heightM: null }];
		const parsed = parseModelsCsv(serialiseCsv(rows, LOUDSPEAKER_CSV_COLUMNS, 'GBP'), LOUDSPEAKER_CSV_COLUMNS, loudspeakerSchema, 'GBP');
		expect(parsed.rows.map((r) => Object.keys(r.errors).sort())).toEqual([['sensitivityDb'], [], ['name', 'weightKg'], ['heightM']]);
		expect(parsed.rows[2].errors.weightKg).toEqual(['Enter a number']);
		// The spreadsheet's own row numbers: the header is row 1, so the first model is row 2.
		expect(parsed.rows.map((r) => r.row)).toEqual([2, 3, 4, 5]);
		expect(parsed.rows[3].errors.name).toBeUndefined();
		expect(parsed.rows[2].errors.name).toEqual(['Same name and maker as row 3']);
		expect(csvErrorEnvelope(parsed)).toHaveProperty(['2.sensitivityDb']);
		expect(csvErrorEnvelope(parsed)).toHaveProperty(['5.heightM']);
	});

	it('refuses a file with missing or unknown columns, or no rows', () => {
		expect(parseModelsCsv('name,maker,colour\r\na,b,red\r\n', AMPLIFIER_CSV_COLUMNS, amplifierSchema, 'GBP').fileErrors).toEqual([
			expect.stringMatching(/^Missing column\(s\): Channels, /),
			'Unknown column(s): colour'
		]);
		expect(parseModelsCsv(AMPLIFIER_CSV_COLUMNS.join(',') + '\r\n', AMPLIFIER_CSV_COLUMNS, amplifierSchema, 'GBP').fileErrors).toEqual(['The file has no rows']);
	});

	it('reads a byte-order mark and blank trailing lines without complaint', () => {
		const text = '\uFEFF' + serialiseCsv([speakers[0]], LOUDSPEAKER_CSV_COLUMNS, 'GBP') + '\r\n\r\n';
		expect(parseModelsCsv(text, LOUDSPEAKER_CSV_COLUMNS, loudspeakerSchema, 'GBP').rows).toHaveLength(1);
	});

	it('writes headers a spreadsheet user reads, with money in the major unit of the currency', () => {
		const [header, first] = serialiseCsv([speakers[0]], LOUDSPEAKER_CSV_COLUMNS, 'GBP').split('\r\n');
		expect(header).toContain('Name,Maker,"Kind (full-range, subwoofer, line-array-element or monitor)"');
		expect(header).toContain('Sensitivity (dB SPL at 1 m)');
		expect(header).toContain('Weight (kg),Day rate (GBP),Replacement value (GBP),Notes');
		expect(header).not.toMatch(/dayRateMinor|Minor/);
		expect(first).toContain(',0.1,30.00,1500.00,'); // 3000 and 150000 minor units
		expect(csvHeader('dayRateMinor', 'EUR')).toBe('Day rate (EUR)');
	});

	it('still imports a file with the old field-name headers, money in minor units', () => {
		const old = [AMPLIFIER_CSV_COLUMNS.join(','), 'Old amp,Old Maker,2,700,1200,,4,1,9,1800,90000,2.5,'].join('\r\n');
		const parsed = parseModelsCsv(old, AMPLIFIER_CSV_COLUMNS, amplifierSchema, 'GBP');
		expect(parsed.fileErrors).toEqual([]);
		expect(parsed.rows[0].data).toMatchObject({ name: 'Old amp', dayRateMinor: 1800, replacementValueMinor: 90000 });
	});

	it('reads money under the new headers in the major unit, refusing more decimals than the currency has', () => {
		const header = AMPLIFIER_CSV_COLUMNS.map((c) => csvHeader(c, 'GBP')).join(',');
		const parsed = parseModelsCsv([header, 'New amp,M,2,700,1200,,4,1,9,18.5,900,2.5,', 'Odd amp,M,2,700,1200,,4,1,9,18.505,900,2.5,'].join('\r\n'), AMPLIFIER_CSV_COLUMNS, amplifierSchema, 'GBP');
		expect(parsed.rows[0].data).toMatchObject({ dayRateMinor: 1850, replacementValueMinor: 90000 });
		expect(parsed.rows[1].errors).toEqual({ dayRateMinor: ['At most 2 decimal places'] });
		const yen = parseModelsCsv([AMPLIFIER_CSV_COLUMNS.map((c) => csvHeader(c, 'JPY')).join(','), 'Yen amp,M,2,700,1200,,4,1,9,4500,90000,2.5,'].join('\r\n'), AMPLIFIER_CSV_COLUMNS, amplifierSchema, 'JPY');
		expect(yen.rows[0].data).toMatchObject({ dayRateMinor: 4500 });
	});

	it('refuses a column given twice under its old and new header, and a money header in another currency', () => {
		const header = [...AMPLIFIER_CSV_COLUMNS.map((c) => csvHeader(c, 'GBP')), 'dayRateMinor'].join(',');
		expect(parseModelsCsv(`${header}\r\nA,M,2,700,1200,,4,1,9,18,900,2.5,,1800\r\n`, AMPLIFIER_CSV_COLUMNS, amplifierSchema, 'GBP').fileErrors).toEqual(['Column(s) given twice: dayRateMinor']);
		const euro = AMPLIFIER_CSV_COLUMNS.map((c) => csvHeader(c, 'EUR')).join(',');
		expect(parseModelsCsv(`${euro}\r\nA,M,2,700,1200,,4,1,9,18,900,2.5,\r\n`, AMPLIFIER_CSV_COLUMNS, amplifierSchema, 'GBP').fileErrors).toEqual([
			'Missing column(s): Day rate (GBP), Replacement value (GBP)',
			'Unknown column(s): Day rate (EUR), Replacement value (EUR)'
		]);
	});
});

import { describe, expect, it } from 'vitest';
import { directivityCsvErrors, parseDirectivityCsv, serialiseDirectivityCsv } from './directivity-csv';

// A test table (not demo data): the layout is our own, `band_hz,<angles…>`, one row per band.
const table = { anglesDeg: [0, 30, 60, 90, 120, 150, 180], bandsDb: { '31.5': [0, 0, 0, 0.5, 1, 1, 1.5], '1000': [0, 1.5, 4, 8.25, 13, 16, 18] } };

describe('directivity CSV', () => {
	it('round-trips: export → import gives the same table and the same text again', () => {
		const text = serialiseDirectivityCsv(table);
		expect(text.split('\r\n').slice(0, 3)).toEqual(['band_hz,0,30,60,90,120,150,180', '31.5,0,0,0,0.5,1,1,1.5', '1000,0,1.5,4,8.25,13,16,18']);
		const parsed = parseDirectivityCsv(text);
		expect(parsed.fileErrors).toEqual([]);
		expect(parsed.table).toEqual(table);
		expect(serialiseDirectivityCsv(parsed.table!)).toBe(text);
	});

	it('reports errors per row and column, and keeps no table (all or nothing)', () => {
		const text = 'band_hz,0,90,180\r\n63,0,1,2\r\n125,0,x,3\r\n250,0,-2,5\r\n500,0,4\r\n100,0,1,2\r\n63,0,0,0\r\n';
		const parsed = parseDirectivityCsv(text);
		expect(parsed.table).toBeNull();
		expect(parsed.rows.map((r) => r.errors)).toEqual([
			{},
			{ '90': ['Enter a number'] },
			{ '90': ['250 Hz at 90°: attenuation is 0 dB or more'] },
			{ values: ['500 Hz: 2 values for 3 angles — give one per angle'] },
			{ band_hz: [expect.stringMatching(/^Use an octave band/)] },
			{ band_hz: ['63 Hz is already on row 1'] }
		]);
		expect(directivityCsvErrors(parsed)).toHaveProperty(['4.values']);
	});

	it('refuses a header that is not band_hz and angles 0 … 180 ascending', () => {
		expect(parseDirectivityCsv('band,0,180\r\n63,0,1\r\n').fileErrors).toEqual(['The first column must be "band_hz"']);
		expect(parseDirectivityCsv('band_hz,0,rear\r\n63,0,1\r\n').fileErrors).toHaveLength(1);
		expect(parseDirectivityCsv('band_hz,0,90\r\n63,0,1\r\n').fileErrors).toEqual(['Header: The last angle must be 180° (behind)']);
		expect(parseDirectivityCsv('band_hz,0,180\r\n').fileErrors).toEqual(['The file has no band rows']);
		expect(parseDirectivityCsv('').fileErrors).toEqual(['The file is empty']);
	});
});

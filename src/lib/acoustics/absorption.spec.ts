import { describe, expect, it } from 'vitest';
import { airAbsorption, bandAbsorption } from './absorption';
import { EXACT_BAND_FREQUENCIES_HZ } from './bands';

const octave = (nominalIndex: number) => EXACT_BAND_FREQUENCIES_HZ[nominalIndex];
const dbPerKm = (f: number, temperatureC: number, humidityPct: number) =>
	1000 * airAbsorption(f, { temperatureC, humidityPct });

/** Half a unit in the table's last printed digit: the honest tolerance for a rounded table entry. */
const halfUnit = (printed: string) => {
	const decimals = printed.includes('.') ? printed.split('.')[1].length : 0;
	return 0.5 * Math.pow(10, -decimals) + 1e-9;
};

// ISO 9613-2:1996 Table 2, α in dB/km for octave bands 63 Hz … 8 kHz at 101.325 kPa.
const TABLE_2: { temperatureC: number; humidityPct: number; values: string[] }[] = [
	{
		temperatureC: 20,
		humidityPct: 70,
		values: ['0.1', '0.3', '1.1', '2.8', '5.0', '9.0', '22.9', '76.6']
	},
	{
		temperatureC: 10,
		humidityPct: 70,
		values: ['0.1', '0.4', '1.0', '1.9', '3.7', '9.7', '32.8', '117']
	},
	{
		temperatureC: 15,
		humidityPct: 20,
		values: ['0.3', '0.6', '1.2', '2.7', '8.2', '28.2', '88.8', '202']
	}
];

describe('ISO 9613-2:1996 Table 2 (octave bands, computed with ISO 9613-1 at exact mid-band frequencies)', () => {
	TABLE_2.forEach(({ temperatureC, humidityPct, values }) => {
		it(`${temperatureC} °C / ${humidityPct} %: every band within the table's rounding`, () => {
			values.forEach((printed, i) => {
				const ours = dbPerKm(octave(i + 1), temperatureC, humidityPct);
				expect(Math.abs(ours - Number(printed))).toBeLessThanOrEqual(halfUnit(printed));
			});
		});
	});
});

describe('ISO 9613-1:1993 Table 1 spot values (dB/km, within the printed rounding)', () => {
	it.each([
		{ T: 20, h: 70, hz: 1000, band: 5, printed: '4.98' },
		{ T: 20, h: 50, hz: 2000, band: 6, printed: '9.86' },
		{ T: 10, h: 70, hz: 4000, band: 7, printed: '32.8' },
		{ T: 30, h: 70, hz: 1000, band: 5, printed: '7.41' }
	])('$T °C, $h %, $hz Hz → $printed', ({ T, h, band, printed }) => {
		expect(Math.abs(dbPerKm(octave(band), T, h) - Number(printed))).toBeLessThanOrEqual(
			halfUnit(printed)
		);
	});
});

describe('airAbsorption', () => {
	it('returns dB per metre and defaults the pressure to 101.325 kPa', () => {
		const air = { temperatureC: 20, humidityPct: 70 };
		expect(airAbsorption(1000, air)).toBeCloseTo(0.00498, 5);
		expect(airAbsorption(1000, { ...air, pressureKPa: 101.325 })).toBe(airAbsorption(1000, air));
	});

	it('is finite in perfectly dry air and rises with frequency', () => {
		const dry = { temperatureC: 20, humidityPct: 0 };
		expect(Number.isFinite(airAbsorption(1000, dry))).toBe(true);
		const bands = EXACT_BAND_FREQUENCIES_HZ.map((f) =>
			airAbsorption(f, { temperatureC: 20, humidityPct: 70 })
		);
		bands.slice(1).forEach((alpha, i) => expect(alpha).toBeGreaterThan(bands[i]));
	});

	it('bandAbsorption caches per air and matches airAbsorption at the exact band frequencies', () => {
		const air = { temperatureC: 12, humidityPct: 55 };
		const bands = bandAbsorption(air);
		EXACT_BAND_FREQUENCIES_HZ.forEach((f, i) => expect(bands[i]).toBe(airAbsorption(f, air)));
		expect(bandAbsorption({ ...air })).toBe(bands);
		expect(bandAbsorption({ ...air, humidityPct: 56 })).not.toBe(bands);
	});

	it('throws actionable errors for impossible air', () => {
		expect(() => airAbsorption(1000, { temperatureC: 20, humidityPct: 120 })).toThrow(
			/humidity must be between 0 and 100/
		);
		expect(() => airAbsorption(1000, { temperatureC: Number.NaN, humidityPct: 50 })).toThrow(
			/temperature.*finite/
		);
		expect(() =>
			airAbsorption(1000, { temperatureC: 20, humidityPct: 50, pressureKPa: 0 })
		).toThrow(/pressure must be greater than zero/);
		expect(() => airAbsorption(-5, { temperatureC: 20, humidityPct: 50 })).toThrow(
			/Frequency must be a positive/
		);
	});
});

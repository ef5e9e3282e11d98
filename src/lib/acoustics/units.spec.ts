import { describe, expect, it } from 'vitest';
import {
	BAND_COUNT,
	EXACT_BAND_FREQUENCIES_HZ,
	NOMINAL_BAND_CENTRES_HZ,
	bandIndexOf,
	exactOctaveFrequencyHz
} from './bands';
import { feetToMetres, metresToFeet, speedOfSound } from './units';

describe('IEC 61260-1 base-10 octave mid-band frequencies', () => {
	it('are 1000·10^(3k/10), k = −5 … 3: 31.62 … 7943 Hz, labelled by nominal centre', () => {
		expect(BAND_COUNT).toBe(9);
		expect(NOMINAL_BAND_CENTRES_HZ).toEqual([31.5, 63, 125, 250, 500, 1000, 2000, 4000, 8000]);
		expect(EXACT_BAND_FREQUENCIES_HZ[0]).toBeCloseTo(31.62, 2);
		expect(EXACT_BAND_FREQUENCIES_HZ[2]).toBeCloseTo(125.89, 2);
		expect(EXACT_BAND_FREQUENCIES_HZ[5]).toBe(1000);
		expect(EXACT_BAND_FREQUENCIES_HZ[8]).toBeCloseTo(7943.28, 2);
		expect(exactOctaveFrequencyHz(1)).toBeCloseTo(1995.26, 2);
	});

	it('bandIndexOf finds nominal centres only', () => {
		expect(bandIndexOf(31.5)).toBe(0);
		expect(bandIndexOf(8000)).toBe(8);
		expect(bandIndexOf(16000)).toBe(-1);
	});
});

describe('units', () => {
	it('1 ft = 0.3048 m exactly (international foot)', () => {
		expect(feetToMetres(1)).toBe(0.3048);
		expect(feetToMetres(100)).toBeCloseTo(30.48, 12);
		expect(metresToFeet(feetToMetres(50))).toBeCloseTo(50, 12);
	});

	it('speed of sound c = 331.3·sqrt(1 + T/273.15): 331.3 m/s at 0 °C, 343.2 m/s at 20 °C', () => {
		expect(speedOfSound(0)).toBe(331.3);
		expect(speedOfSound(20)).toBeCloseTo(343.2, 1);
	});
});

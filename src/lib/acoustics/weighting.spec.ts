import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import { EXACT_BAND_FREQUENCIES_HZ, NOMINAL_BAND_CENTRES_HZ } from './bands';
import { aWeighting, cWeighting, weighting } from './weighting';
import type { Weighting } from './types';

// IEC 61672-1:2013 Table 3 at the octave centres, and the Class 1 acceptance limits there.
const TABLE_3: { hz: number; a: number; c: number; class1: [number, number] }[] = [
	{ hz: 31.5, a: -39.4, c: -3.0, class1: [-1.5, 1.5] },
	{ hz: 63, a: -26.2, c: -0.8, class1: [-1.0, 1.0] },
	{ hz: 125, a: -16.1, c: -0.2, class1: [-1.0, 1.0] },
	{ hz: 250, a: -8.6, c: 0.0, class1: [-1.0, 1.0] },
	{ hz: 500, a: -3.2, c: 0.0, class1: [-1.0, 1.0] },
	{ hz: 1000, a: 0.0, c: 0.0, class1: [-0.7, 0.7] },
	{ hz: 2000, a: 1.2, c: -0.2, class1: [-1.0, 1.0] },
	{ hz: 4000, a: 1.0, c: -0.8, class1: [-1.0, 1.0] },
	{ hz: 8000, a: -1.1, c: -3.0, class1: [-2.5, 1.5] }
];

describe('IEC 61672-1:2013 Table 3, octave centres (computed at exact base-10 frequencies)', () => {
	TABLE_3.forEach(({ hz, a, c, class1: [below, above] }) => {
		const exactHz = EXACT_BAND_FREQUENCIES_HZ[NOMINAL_BAND_CENTRES_HZ.indexOf(hz as never)];
		it(`A and C at ${hz} Hz: within 0.05 dB of the printed value and inside Class 1 limits`, () => {
			for (const [ours, printed] of [
				[aWeighting(exactHz), a],
				[cWeighting(exactHz), c]
			]) {
				expect(Math.abs(ours - printed)).toBeLessThanOrEqual(0.05);
				expect(ours - printed).toBeGreaterThanOrEqual(below);
				expect(ours - printed).toBeLessThanOrEqual(above);
			}
		});
	});

	it('at nominal 125 Hz the formula gives −16.19, not the printed −16.1: why the model uses exact frequencies', () => {
		expect(aWeighting(125)).toBeCloseTo(-16.19, 2);
		expect(Math.abs(aWeighting(125) - -16.1)).toBeGreaterThan(0.05);
	});

	it('both weightings are 0.00 dB at 1 kHz (normalisation constants A1000 = −2.000, C1000 = −0.062)', () => {
		expect(Math.abs(aWeighting(1000))).toBeLessThan(0.005);
		expect(Math.abs(cWeighting(1000))).toBeLessThan(0.005);
	});

	// One-third-octave entries of Table 3 outside the octave set; from memory, checked against the formula.
	it('Table 3 extremes (from memory): A 20 Hz −50.5, 10 kHz −2.5, 20 kHz −9.3; C 20 Hz −6.2, 20 kHz −11.2', () => {
		const exact = (k3: number) => 1000 * Math.pow(10, k3 / 10); // one-third-octave exact frequency
		expect(aWeighting(exact(-17))).toBeCloseTo(-50.5, 1);
		expect(aWeighting(exact(10))).toBeCloseTo(-2.5, 1);
		expect(aWeighting(exact(13))).toBeCloseTo(-9.3, 1);
		expect(cWeighting(exact(-17))).toBeCloseTo(-6.2, 1);
		expect(cWeighting(exact(13))).toBeCloseTo(-11.2, 1);
	});
});

describe('cross-check against the npm package a-weighting 1.1.0 (linear gain, older f4 = 12200 Hz)', () => {
	const require = createRequire(import.meta.url);
	const aGain = require('a-weighting/a') as (f: number) => number;
	const cGain = require('a-weighting/c') as (f: number) => number;

	it('A and C in dB agree within 0.01 dB from 20 Hz to 20 kHz', () => {
		for (let i = 0; i <= 300; i++) {
			const f = 20 * Math.pow(1000, i / 300);
			expect(Math.abs(20 * Math.log10(aGain(f)) - aWeighting(f))).toBeLessThan(0.01);
			expect(Math.abs(20 * Math.log10(cGain(f)) - cWeighting(f))).toBeLessThan(0.01);
		}
	});
});

describe('weighting()', () => {
	it('dispatches A and C, and Z is flat', () => {
		expect(weighting('A', 63)).toBe(aWeighting(63));
		expect(weighting('C', 63)).toBe(cWeighting(63));
		expect(weighting('Z', 63)).toBe(0);
	});

	it('throws a clear error on an unknown weighting', () => {
		expect(() => weighting('B' as Weighting, 1000)).toThrow(
			/unknown weighting "B".*'A', 'C' or 'Z'/
		);
	});
});

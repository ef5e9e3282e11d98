import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
	lineSourceDivergenceDb,
	lineSourceTransitionM,
	pointSourceDivergenceDb,
	sumLevels,
	sumLevelsCoherent
} from './levels';
import { feetToMetres } from './units';

describe('decibel summation (textbook examples)', () => {
	it('80 dB + 85 dB → 86.2 dB incoherent, 88.9 dB coherent', () => {
		expect(sumLevels([80, 85])).toBeCloseTo(86.19, 2);
		expect(sumLevelsCoherent([80, 85])).toBeCloseTo(88.9, 1);
	});

	it('N equal incoherent sources add 10·lg N (2 → 3.01, 4 → 6.02); coherent add 20·lg N (2 → 6.02, 4 → 12.04)', () => {
		expect(sumLevels([90, 90]) - 90).toBeCloseTo(3.01, 2);
		expect(sumLevels([90, 90, 90, 90]) - 90).toBeCloseTo(6.02, 2);
		expect(sumLevelsCoherent([90, 90]) - 90).toBeCloseTo(6.02, 2);
		expect(sumLevelsCoherent([90, 90, 90, 90]) - 90).toBeCloseTo(12.04, 2);
	});

	it('an empty list is silence, −Infinity; −Infinity entries contribute nothing', () => {
		expect(sumLevels([])).toBe(-Infinity);
		expect(sumLevels([-Infinity, 70])).toBeCloseTo(70, 12);
	});

	it('property: N equal levels sum to L + 10·lg N, order does not matter, and the sum is at least the largest', () => {
		fc.assert(
			fc.property(
				fc.double({ min: -20, max: 150, noNaN: true }),
				fc.integer({ min: 1, max: 64 }),
				(level, n) => {
					expect(sumLevels(Array(n).fill(level))).toBeCloseTo(level + 10 * Math.log10(n), 9);
				}
			)
		);
		fc.assert(
			fc.property(
				fc.array(fc.double({ min: 0, max: 140, noNaN: true }), { minLength: 1, maxLength: 12 }),
				(levels) => {
					const sum = sumLevels(levels);
					expect(sumLevels([...levels].reverse())).toBeCloseTo(sum, 9);
					expect(sum).toBeGreaterThanOrEqual(Math.max(...levels) - 1e-9);
				}
			)
		);
	});
});

describe('point-source divergence', () => {
	it('ISO 9613-2:1996 eq. (7): A_div = 20·lg(d/1 m) + 11 dB → 51.0 dB at 100 m', () => {
		// Eq. (7) relates to the sound power level; the 11 dB is the 10·lg(4π) of a free-field point source.
		expect(pointSourceDivergenceDb(100) + 11).toBeCloseTo(51.0, 1);
		expect(10 * Math.log10(4 * Math.PI)).toBeCloseTo(11, 0);
	});

	it('common practice: 6 dB less per doubling of distance', () => {
		expect(pointSourceDivergenceDb(20) - pointSourceDivergenceDb(10)).toBeCloseTo(6.02, 2);
	});

	it('common practice: 85 dB(A) at 50 ft → 79 dB(A) at 100 ft', () => {
		const at100ft =
			85 - (pointSourceDivergenceDb(feetToMetres(100)) - pointSourceDivergenceDb(feetToMetres(50)));
		expect(at100ft).toBeCloseTo(79, 0);
	});
});

describe('line-source divergence', () => {
	it('conventional transition d_t = L²·f/(2c): L = 4 m, 1 kHz, c = 343 m/s → 23.3 m', () => {
		expect(lineSourceTransitionM(4, 1000, 343)).toBeCloseTo(23.3, 1);
	});

	it('common practice: about 3 dB per doubling up to the transition, 6 dB beyond; continuous at d_t', () => {
		const dt = lineSourceTransitionM(4, 1000, 343);
		expect(lineSourceDivergenceDb(8, dt) - lineSourceDivergenceDb(4, dt)).toBeCloseTo(3.01, 2);
		expect(lineSourceDivergenceDb(100, dt) - lineSourceDivergenceDb(50, dt)).toBeCloseTo(6.02, 2);
		expect(lineSourceDivergenceDb(dt * (1 - 1e-12), dt)).toBeCloseTo(
			lineSourceDivergenceDb(dt, dt),
			9
		);
	});

	it('a transition at or inside 1 m is a plain point source', () => {
		for (const x of [0.5, 1, 3, 40])
			expect(lineSourceDivergenceDb(x, 1)).toBe(pointSourceDivergenceDb(x));
	});

	it('property: inside d_t the level sits below the far-field (20·lg N) extrapolation and falls 3 dB per doubling; beyond, the laws agree', () => {
		fc.assert(
			fc.property(
				fc.double({ min: 1.01, max: 500, noNaN: true }),
				fc.double({ min: 0.1, max: 1000, noNaN: true }),
				(dt, x) => {
					const line = lineSourceDivergenceDb(x, dt);
					if (x >= dt) expect(line).toBe(pointSourceDivergenceDb(x));
					else {
						expect(line).toBeGreaterThanOrEqual(pointSourceDivergenceDb(x) - 1e-9);
						expect(lineSourceDivergenceDb(x / 2, dt) - line).toBeCloseTo(-10 * Math.log10(2), 9);
					}
				}
			)
		);
	});
});

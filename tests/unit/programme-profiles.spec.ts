/**
 * A check of the seeded demo programme profiles against a common-practice range, not a reference test:
 * C-weighted levels of amplified music run roughly 10–20 dB above A-weighted ones (common practice,
 * shared/acoustics.md "Facts of the trade"); speech, with little below 125 Hz, far less. The gap is
 * computed with the model's own IEC 61672-1 weightings at the exact band frequencies.
 */
import { describe, expect, it } from 'vitest';
import { aWeighting, bandIndexOf, cWeighting, EXACT_BAND_FREQUENCIES_HZ, sumLevels } from '../../src/lib/acoustics';
import { programmes } from '../../seeders/data/programmes';

/** dB(C) − dB(A) of a spectrum given as relative octave-band levels (any reference). */
function cMinusA(bands: Record<string, number>): number {
	const entries = Object.entries(bands).map(([band, level]) => ({ level, f: EXACT_BAND_FREQUENCIES_HZ[bandIndexOf(Number(band))] }));
	return sumLevels(entries.map((e) => e.level + cWeighting(e.f))) - sumLevels(entries.map((e) => e.level + aWeighting(e.f)));
}

// Common practice (not a standard): the gap each kind of programme shows at front of house.
const EXPECTED_GAP_DB: Record<string, [number, number]> = {
	'pop-rock': [10, 20],
	dance: [10, 20],
	acoustic: [3, 10],
	speech: [0, 6]
};

describe('seeded programme profiles: C-minus-A at the position (demo data vs common practice)', () => {
	for (const p of programmes) {
		it(`${p.name}: C − A within the common-practice range`, () => {
			const [low, high] = EXPECTED_GAP_DB[p.slug];
			const gap = cMinusA(p.bands as Record<string, number>);
			expect(gap).toBeGreaterThanOrEqual(low);
			expect(gap).toBeLessThanOrEqual(high);
			expect(p.crestFactorDb).toBeGreaterThanOrEqual(3);
		});
	}

	it('speech has the smallest gap and dance the largest', () => {
		const gaps = Object.fromEntries(programmes.map((p) => [p.slug, cMinusA(p.bands as Record<string, number>)]));
		expect(Math.min(...Object.values(gaps))).toBe(gaps.speech);
		expect(Math.max(...Object.values(gaps))).toBe(gaps.dance);
	});
});

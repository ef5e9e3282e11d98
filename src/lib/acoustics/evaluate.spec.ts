import { describe, expect, it } from 'vitest';
import { airAbsorption } from './absorption';
import { aWeighting } from './weighting';
import { evaluatePackage } from './evaluate';
import { FLAT_OCTAVES, amplifier, group, request } from '../../../tests/helpers/acoustics/fixtures';
import { sumLevels } from './levels';
import { speedOfSound } from './units';
import type { GroupSpec, QuoteRequest } from './types';

const AIR = { temperatureC: 20, humidityPct: 70 };
const alpha1k = airAbsorption(1000, AIR);
const holtAt1m = 92 + 10 * Math.log10(160); // Holt (Stereophile): 114 dB at 1 m
const one = (g: GroupSpec, r: Partial<QuoteRequest> = {}) =>
	evaluatePackage({ groups: [g] }, request(r));

describe('evaluatePackage: one Holt cabinet (92 dB/1 W/1 m, 160 W), 1 kHz programme, 90 dB(Z) at 10 m', () => {
	const result = one(group());
	const expectedCapability = holtAt1m - 20 - alpha1k * 10; // inverse square law + ISO 9613-1 absorption

	it('reports the band at its nominal centre with requirement, capability and headroom', () => {
		expect(result.bands).toHaveLength(1);
		const [band] = result.bands;
		expect(band.hz).toBe(1000);
		expect(band.requiredDb).toBeCloseTo(90, 12);
		expect(band.requiredPeakDb).toBeCloseTo(90, 12);
		expect(band.capabilityDb).toBeCloseTo(expectedCapability, 12);
		// v2 step 2: the amplifier's sine rating delivers peaks of 2·P_cab (+3.01 dB, peak of a sine).
		expect(band.capabilityPeakDb).toBeCloseTo(expectedCapability + 10 * Math.log10(2), 12);
		expect(band.headroomDb).toBeCloseTo(expectedCapability - 90, 12);
	});

	it('headroom ≈ 4.0 dB ≥ 3 dB default margin → clear, limited by the amplifier', () => {
		expect(result.headroomDb).toBeCloseTo(3.99, 2);
		expect(result.verdict).toBe('clear');
		expect(result.limitingBandHz).toBe(1000);
		expect(result.limitedBy).toBe('amplifier');
		expect(result.boundary).toBeNull();
	});
});

describe('step 3: group laws', () => {
	const at1k = (g: GroupSpec, distanceM = 10) => one(g, { distanceM }).bands[0].capabilityDb;
	const single = at1k(group());

	it('full-range cabinets add incoherently: 2 per stack × 2 stacks = +10·lg 4 = +6.02 dB', () => {
		expect(at1k(group({ count: 2, stacks: 2 })) - single).toBeCloseTo(10 * Math.log10(4), 12);
	});

	it('subwoofers add coherently within a stack, incoherently between: 2 × 2 = +20·lg 2 + 10·lg 2 = +9.03 dB', () => {
		const sub = (count: number, stacks: number) =>
			at1k(group({ count, stacks }, { kind: 'subwoofer' }));
		expect(sub(2, 2) - sub(1, 1)).toBeCloseTo(20 * Math.log10(2) + 10 * Math.log10(2), 12);
	});

	it('line array inside its transition: L1 + 20·lg N − 20·lg d_t − 10·lg(x/d_t) − α·x', () => {
		const c = speedOfSound(20);
		const dt = ((8 * 0.5) ** 2 * 1000) / (2 * c); // ≈ 23.3 m for a 4 m array at 1 kHz
		const hang = group({ count: 8 }, { kind: 'line-array-element', heightM: 0.5 });
		const expected =
			holtAt1m + 20 * Math.log10(8) - 20 * Math.log10(dt) - 10 * Math.log10(10 / dt) - alpha1k * 10;
		expect(at1k(hang, 10)).toBeCloseTo(expected, 10);
		expect(at1k(hang, 50)).toBeCloseTo(
			holtAt1m + 20 * Math.log10(8) - 20 * Math.log10(50) - alpha1k * 50,
			10
		);
	});

	it('a line array whose transition is within 1 m is a point source of gain 20·lg N (31.5 Hz, 4 m)', () => {
		const hang = group({ count: 8 }, { kind: 'line-array-element', heightM: 0.5, lowHz: 25 });
		const low = evaluatePackage(
			{ groups: [hang] },
			request({ programme: { bandsDb: { 31.5: 0 }, crestFactorDb: 0 } })
		);
		const alpha = airAbsorption(1000 * 10 ** -1.5, AIR);
		expect(low.bands[0].capabilityDb).toBeCloseTo(
			holtAt1m + 20 * Math.log10(8) - 20 - alpha * 10,
			10
		);
	});

	it('a band counts when lowHz ≤ nominal centre ≤ highHz (63 Hz counts from lowHz = 63, not from 63.1)', () => {
		const programme = { bandsDb: { 63: 0, 8000: 0 }, crestFactorDb: 0 };
		const edges = evaluatePackage(
			{ groups: [group({}, { lowHz: 63, highHz: 8000 })] },
			request({ programme })
		);
		expect(edges.bands.every((b) => Number.isFinite(b.capabilityDb))).toBe(true);
		const missed = evaluatePackage(
			{ groups: [group({}, { lowHz: 64, highHz: 7999 })] },
			request({ programme })
		);
		expect(missed.bands.every((b) => b.capabilityDb === -Infinity)).toBe(true);
	});
});

describe('numerical range', () => {
	it('a covered band stays finite where absorption reaches thousands of dB (8 kHz at 20 km, 15 °C / 20 %)', () => {
		const programme = { bandsDb: { 8000: 0 }, crestFactorDb: 0 };
		const air = { temperatureC: 15, humidityPct: 20 };
		const r = evaluatePackage({ groups: [group()] }, request({ programme, air, distanceM: 20000 }));
		const alpha = airAbsorption(1000 * 10 ** 0.9, air);
		expect(alpha * 20000).toBeGreaterThan(1000);
		expect(r.bands[0].capabilityDb).toBeCloseTo(
			holtAt1m - 20 * Math.log10(20000) - alpha * 20000,
			8
		);
		expect(r.limitedBy).toBe('amplifier');
	});
});

describe('step 4: requirement scaled to the weighted target', () => {
	it('flat octaves at 100 dB(A): weighted sum of Q_b is the target, peak is Q_b + crest', () => {
		const result = evaluatePackage(
			{ groups: [group()] },
			request({ targetDb: 100, weighting: 'A', programme: FLAT_OCTAVES })
		);
		const weighted = result.bands.map(
			(b, i) => b.requiredDb + aWeighting(1000 * 10 ** ((3 * (i - 5)) / 10))
		);
		expect(sumLevels(weighted)).toBeCloseTo(100, 10);
		result.bands.forEach((b) => expect(b.requiredPeakDb - b.requiredDb).toBeCloseTo(12, 12));
		expect(result.bands.map((b) => b.hz)).toEqual([
			31.5, 63, 125, 250, 500, 1000, 2000, 4000, 8000
		]);
	});
});

describe('step 5: limitedBy', () => {
	const crest = (crestFactorDb: number) => ({ programme: { bandsDb: { 1000: 0 }, crestFactorDb } });
	const bigAmp = amplifier({ powerW: { 8: 10000 } });

	it('amplifier: P_cab below the rating, peak side binds', () => {
		expect(one(group({}, { powerContinuousW: 1000 }), crest(10)).limitedBy).toBe('amplifier');
	});

	it('thermal: peak side binds at the 4× peak rating', () => {
		expect(one(group({ amplifier: bigAmp }, { powerContinuousW: 160 }), crest(10)).limitedBy).toBe(
			'thermal'
		);
	});

	it('thermal on the continuous side when the crest factor is below the 6 dB peak allowance', () => {
		const r = one(group({ amplifier: bigAmp }, { powerContinuousW: 160 }), crest(3));
		expect(r.headroomDb).toBeCloseTo(r.bands[0].capabilityDb - r.bands[0].requiredDb, 12);
		expect(r.limitedBy).toBe('thermal');
	});

	it('max-spl on the peak side and on the continuous side', () => {
		expect(
			one(group({ amplifier: bigAmp }, { powerContinuousW: 160, maxSplPeakDb: 110 }), crest(3))
				.limitedBy
		).toBe('max-spl');
		expect(
			one(
				group({ amplifier: bigAmp }, { powerContinuousW: 160, maxSplContinuousDb: 100 }),
				crest(3)
			).limitedBy
		).toBe('max-spl');
	});

	it('peak side wins a tie: continuous thermal (P_cab = rating) vs peak amplifier, crest 3.01 dB → amplifier', () => {
		// v2: peak capability is +10·lg 2 above continuous here, so a 10·lg 2 crest factor ties the sides.
		expect(one(group({}, { powerContinuousW: 160 }), crest(10 * Math.log10(2))).limitedBy).toBe(
			'amplifier'
		);
		expect(one(group({}, { powerContinuousW: 160 }), crest(0)).limitedBy).toBe('thermal');
	});

	it('names the group contributing most in the limiting band, whatever its place in the package', () => {
		const loudThermal = group({ amplifier: bigAmp }, { powerContinuousW: 500 });
		const quietAmp = group({}, { sensitivityDb: 80 });
		expect(evaluatePackage({ groups: [quietAmp, loudThermal] }, request(crest(10))).limitedBy).toBe(
			'thermal'
		);
		expect(evaluatePackage({ groups: [loudThermal, quietAmp] }, request(crest(10))).limitedBy).toBe(
			'thermal'
		);
	});

	it('no-coverage: a programme band no group covers has −Infinity headroom; the lowest such band is named', () => {
		const r = one(group({}, { lowHz: 100 }), {
			programme: { bandsDb: { 31.5: 0, 63: 0, 1000: 0 }, crestFactorDb: 6 }
		});
		expect(r.bands[0].capabilityDb).toBe(-Infinity);
		expect(r.bands[0].headroomDb).toBe(-Infinity);
		expect([r.headroomDb, r.limitingBandHz, r.limitedBy, r.verdict]).toEqual([
			-Infinity,
			31.5,
			'no-coverage',
			'short'
		]);
	});

	it('an empty package covers nothing: short, no-coverage, no amplifiers', () => {
		const r = evaluatePackage({ groups: [] }, request({ audienceWidthM: 10 }));
		expect([
			r.verdict,
			r.limitedBy,
			r.amplifiersNeeded,
			r.amplifierChannelsNeeded,
			r.coverage.widthM
		]).toEqual(['short', 'no-coverage', 0, 0, 0]);
	});
});

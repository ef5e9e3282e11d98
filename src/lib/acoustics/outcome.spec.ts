// Contract steps 6–8 and the amplifier counts; steps 1–5 are in evaluate.spec.ts.
import { describe, expect, it } from 'vitest';
import { airAbsorption } from './absorption';
import { evaluatePackage } from './evaluate';
import { amplifier, group, request } from '../../../tests/helpers/acoustics/fixtures';
import { feetToMetres } from './units';
import type { GroupSpec, QuoteRequest } from './types';

const AIR = { temperatureC: 20, humidityPct: 70 };
const alpha1k = airAbsorption(1000, AIR);
const one = (g: GroupSpec, r: Partial<QuoteRequest> = {}) =>
	evaluatePackage({ groups: [g] }, request(r));

describe('steps 6 and 7: coverage and verdict', () => {
	const base = one(group({ stacks: 2 }));
	const H = base.headroomDb;

	it('v2: two 90° stacks do not add: 2·d·tan 45° = 20 m at 10 m, plus spacingM between the outer stacks', () => {
		expect(one(group({ stacks: 2 }), { audienceWidthM: 20 }).coverage).toEqual({
			widthM: expect.closeTo(20, 9),
			audienceWidthM: 20,
			ok: true
		});
		expect(one(group({ stacks: 2, spacingM: 12 }), { audienceWidthM: 32 }).coverage).toEqual({
			widthM: expect.closeTo(32, 9),
			audienceWidthM: 32,
			ok: true
		});
		// spacingM counts only with more than one stack.
		expect(one(group({ stacks: 1, spacingM: 12 })).coverage.widthM).toBeCloseTo(20, 9);
	});

	it('v2: the widest group sets the width (max, not sum); ≥ 180° is unbounded; subwoofers and monitors do not count', () => {
		const narrow = group({}, { dispersionHDeg: 60 });
		const wide = group({}, { dispersionHDeg: 120 });
		const r = evaluatePackage({ groups: [narrow, wide] }, request());
		expect(r.coverage.widthM).toBeCloseTo(2 * 10 * Math.tan(Math.PI / 3), 9);
		expect(one(group({}, { dispersionHDeg: 180 })).coverage.widthM).toBe(Infinity);
		expect(one(group({}, { kind: 'subwoofer' }), { audienceWidthM: 1 }).coverage).toEqual({
			widthM: 0,
			audienceWidthM: 1,
			ok: false
		});
		expect(one(group({}, { kind: 'monitor' })).coverage.widthM).toBe(0);
		expect(base.coverage).toEqual({
			widthM: expect.closeTo(20, 9),
			audienceWidthM: null,
			ok: true
		});
	});

	it('clear when H ≥ margin (equality included), tight when 0 ≤ H < margin, short when H < 0', () => {
		expect(H).toBeGreaterThan(0);
		expect(one(group({ stacks: 2 }), { marginDb: H }).verdict).toBe('clear');
		expect(one(group({ stacks: 2 }), { marginDb: H + 1e-6 }).verdict).toBe('tight');
		expect(one(group({ stacks: 2 }), { marginDb: 0, targetDb: 90 + H + 0.01 }).verdict).toBe(
			'short'
		);
	});

	it('coverage failing with H ≥ 0 makes the verdict short and limitedBy "coverage"', () => {
		const r = one(group({ stacks: 2 }), { audienceWidthM: 21 });
		expect([r.verdict, r.limitedBy, r.limitingBandHz]).toEqual(['short', 'coverage', 1000]);
	});

	it('with H < 0 the headroom reason stays even when coverage also fails', () => {
		const r = one(group({ stacks: 2 }), { audienceWidthM: 21, targetDb: 120 });
		expect([r.verdict, r.limitedBy]).toEqual(['short', 'amplifier']);
	});
});

describe('step 8: boundary', () => {
	it('single cabinet at 1 kHz: 90 dB(Z) at 10 m → 90 − 20 − α·90 at 100 m; maxTargetDb meets the limit exactly', () => {
		const boundary = { distanceM: 100, limitDb: 75, weighting: 'Z' as const };
		const r = one(group(), { boundary });
		const predicted = 90 - 20 - alpha1k * 90;
		expect(r.boundary).toEqual({
			predictedDb: expect.closeTo(predicted, 10),
			limitDb: 75,
			weighting: 'Z',
			marginDb: expect.closeTo(75 - predicted, 10),
			maxTargetDb: expect.closeTo(90 + 75 - predicted, 10)
		});
		const atMax = one(group(), { boundary, targetDb: r.boundary!.maxTargetDb });
		expect(atMax.boundary!.predictedDb).toBeCloseTo(75, 10);
	});

	it('common practice: 85 dB(A) at 50 ft → 79 dB(A) at 100 ft (point source, 1 kHz)', () => {
		const r = one(group(), {
			targetDb: 85,
			weighting: 'A',
			distanceM: feetToMetres(50),
			boundary: { distanceM: feetToMetres(100), limitDb: 80, weighting: 'A' }
		});
		expect(r.boundary!.predictedDb).toBeCloseTo(79, 0);
	});

	it('common practice: the C − A gap of a bass-heavy programme widens with distance (air absorbs the top end)', () => {
		const programme = {
			bandsDb: { 63: 6, 125: 4, 250: 0, 500: -2, 1000: -4, 2000: -6, 4000: -8, 8000: -10 },
			crestFactorDb: 12
		};
		const pkg = { groups: [group({}, { lowHz: 40 })] };
		const gapAt = (distanceM: number) => {
			const atBoundary = (w: 'A' | 'C') =>
				evaluatePackage(
					pkg,
					request({
						programme,
						weighting: 'A',
						targetDb: 100,
						distanceM: 20,
						boundary: { distanceM, limitDb: 70, weighting: w }
					})
				).boundary!.predictedDb;
			return atBoundary('C') - atBoundary('A');
		};
		expect(gapAt(500)).toBeGreaterThan(gapAt(20));
	});
});

describe('amplifier counts', () => {
	it('channels = Σ stacks·ceil(count/k); amplifiers per model (same spec pools channels), ceil(channels/amp.channels)', () => {
		const fourChannel = () => amplifier({ channels: 4 });
		const tops = group({ count: 2, stacks: 2, cabinetsPerChannel: 2, amplifier: fourChannel() });
		const subs = group(
			{ count: 3, stacks: 2, cabinetsPerChannel: 2, amplifier: fourChannel() },
			{ kind: 'subwoofer' }
		);
		expect(evaluatePackage({ groups: [tops, subs] }, request())).toMatchObject({
			amplifierChannelsNeeded: 6,
			amplifiersNeeded: 2
		});
		const otherModel = group({ count: 1, amplifier: amplifier({ channels: 4, minLoadOhm: 4 }) });
		expect(evaluatePackage({ groups: [tops, subs, otherModel] }, request())).toMatchObject({
			amplifierChannelsNeeded: 7,
			amplifiersNeeded: 3
		});
	});
});

// Choices the model makes where contract v2 is silent, listed in index.ts.
import { describe, expect, it } from 'vitest';
import { group, request } from '../../../tests/helpers/acoustics/fixtures';
import { airAbsorption } from './absorption';
import { evaluatePackage } from './evaluate';
import type { GroupSpec, QuoteRequest, Receiver, Site } from './types';

const AIR = { temperatureC: 20, humidityPct: 70 };
const alpha1k = airAbsorption(1000, AIR);
const site = (overrides: Partial<Site> = {}): Site => ({
	aimDeg: 0,
	groundFactor: null,
	receivers: [],
	...overrides
});
const receiver = (overrides: Partial<Receiver> = {}): Receiver => ({
	name: 'Fence',
	x: 0,
	y: 100,
	limitDb: 75,
	weighting: 'Z',
	...overrides
});
const one = (g: GroupSpec, r: Partial<QuoteRequest> = {}) =>
	evaluatePackage({ groups: [g] }, request(r));

describe('choices where the contract is silent (index.ts)', () => {
	it('band response is added after the max SPL cap, as step 2 orders it', () => {
		const g = (response: number) =>
			one(group({}, { maxSplContinuousDb: 100, bandResponseDb: { 1000: response } }));
		expect(g(3).bands[0].capabilityDb - g(0).bands[0].capabilityDb).toBeCloseTo(3, 12);
	});

	it('limits tie: the first receiver in the site’s order binds, the boundary after the receivers', () => {
		const twins = [receiver({ name: 'A' }), receiver({ name: 'B' })];
		expect(one(group(), { site: site({ receivers: twins }) }).limits.bindingReceiver).toBe('A');
		const r = one(group(), {
			site: site({ receivers: [receiver({ name: 'A', limitDb: 70 })] }),
			boundary: { distanceM: 100, limitDb: 70, weighting: 'Z' }
		});
		expect(r.boundary!.maxTargetDb).toBeCloseTo(r.receivers[0].maxTargetDb!, 9);
		expect(r.limits.bindingReceiver).toBe(
			r.boundary!.maxTargetDb < r.receivers[0].maxTargetDb! ? 'boundary' : 'A'
		);
	});

	it('a band-limited receiver reports the weighting it was given; its level is unweighted', () => {
		const programme = { bandsDb: { 63: 0, 1000: 0 }, crestFactorDb: 12 };
		const asA = receiver({ bandHz: 63, weighting: 'A' });
		const asZ = receiver({ bandHz: 63, weighting: 'Z' });
		const [a, z] = one(group({}, { lowHz: 40 }), {
			programme,
			site: site({ receivers: [asA, asZ] })
		}).receivers;
		expect(a.weighting).toBe('A');
		expect(a.predictedDb).toBe(z.predictedDb);
	});

	it('directivity table values may be negative (measured polars can exceed on-axis)', () => {
		const g = group({ directivity: { anglesDeg: [0, 30, 180], bandsDb: { 1000: [0, -1, 12] } } });
		const r = one(g, {
			site: site({
				receivers: [receiver({ x: 100 * Math.sin(Math.PI / 6), y: 100 * Math.cos(Math.PI / 6) })]
			})
		});
		const onAxis = one(g, { site: site({ receivers: [receiver()] }) });
		expect(r.receivers[0].predictedDb! - onAxis.receivers[0].predictedDb!).toBeCloseTo(1, 9);
	});

	it('a receiver right under the system is at slant distance |Δh| (never below 1 m)', () => {
		const level = (heightM: number) =>
			one(group(), { site: site({ receivers: [receiver({ x: 0, y: 0, heightM })] }) }).receivers[0];
		expect(level(9.5).offAxisDeg).toBe(0);
		expect(level(9.5).distanceM).toBe(0);
		// |Δh| = 0 and 0.5 m both count as 1 m; 8 m up is 8 m away.
		expect(level(1.5).predictedDb).toBeCloseTo(level(2).predictedDb!, 12);
		expect(level(1.5).predictedDb! - level(9.5).predictedDb!).toBeCloseTo(
			20 * Math.log10(8) + alpha1k * 7,
			9
		);
	});

	it('compression must be ≥ 0 and band response keys must be octave bands', () => {
		expect(() => one(group({}, { compressionDb: -1 }))).toThrow(
			/power compression cannot be negative/
		);
		expect(() => one(group({}, { bandResponseDb: { 100: 0 } as never }))).toThrow(
			/band response "100" is not one of the model's octave bands/
		);
	});
});

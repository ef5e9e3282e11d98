import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { evaluatePackage, type QuoteRequest } from '../acoustics';
import { toPackageSpec, type AmplifierModelRow, type LoadedGroup, type LoudspeakerModelRow } from '../inventory';
import { chainsOf, dayCost, groupOf, MIN_PATTERN_CABINETS, unitsOverStock, type StockCatalogue } from './chains';
import { searchBudgetMs, suggestSystemsNow } from './search';

// Round-figure test models, not the demo stock.
const stamp = { createdAt: '2027-01-01T00:00:00.000Z', updatedAt: '2027-01-01T00:00:00.000Z' };
function speaker(id: number, kind: 'full-range' | 'subwoofer', sensitivityDb: number, dayRateMinor: number): LoudspeakerModelRow {
	const sub = kind === 'subwoofer';
	return {
		id, ...stamp, name: `Speaker ${id}`, maker: 'Test', kind, sensitivityDb, sensitivityRef: '1W', impedanceOhm: 8,
		powerContinuousW: sub ? 1000 : 500, powerPeakW: null, maxSplContinuousDb: null, maxSplPeakDb: null,
		dispersionHDeg: 90, dispersionVDeg: 40, lowHz: sub ? 35 : 60, highHz: sub ? 120 : 18000, heightM: null,
		weightKg: 30, dayRateMinor, replacementValueMinor: 100000, notes: ''
	} as unknown as LoudspeakerModelRow;
}
function amplifier(id: number, channels: number, powerW8: number, dayRateMinor: number): AmplifierModelRow {
	return {
		id, ...stamp, name: `Amp ${id}`, maker: 'Test', channels, powerW8, powerW4: powerW8 * 1.6, powerW2: null, minLoadOhm: 4,
		rackUnits: 2, weightKg: 12, dayRateMinor, replacementValueMinor: 200000, mainsCurrentAmps: 3, notes: ''
	} as unknown as AmplifierModelRow;
}
const programme = { bandsDb: { 63: 0, 125: 0, 250: 0, 500: 0, 1000: 0, 2000: 0, 4000: 0 }, crestFactorDb: 12 };
const request = (targetDb: number, distanceM: number, site?: QuoteRequest['site']): QuoteRequest => ({
	targetDb, weighting: 'A', distanceM, programme, air: { temperatureC: 20, humidityPct: 50 }, marginDb: 3, ...(site ? { site } : {})
});
/** A round-figure pattern that rejects the rear at low frequencies, as a cardioid arrangement does. */
const rearRejecting = { anglesDeg: [0, 90, 180], bandsDb: { '63': [0, 6, 20], '125': [0, 6, 16] } };
/** A neighbour straight behind the system with a dB(C) limit, where a group pattern matters. */
const behind = (limitDb: number): QuoteRequest['site'] => ({ aimDeg: 0, groundFactor: 0.5, receivers: [{ name: 'Behind', x: 0, y: -80, limitDb, weighting: 'C' }] });

/** Every system the search space holds, evaluated: the slow truth the search must agree with. */
function exhaustiveCheapest(catalogue: StockCatalogue, req: QuoteRequest): number | null {
	let best: number | null = null;
	const mains = chainsOf(catalogue, 'main');
	const subs = [null, ...chainsOf(catalogue, 'sub')];
	for (const main of mains)
		for (const sub of subs)
			for (let m = main.minCount; m <= main.maxCount; m++)
				for (let s = sub?.minCount ?? 0; s <= (sub?.maxCount ?? 0); s++) {
					const groups: LoadedGroup[] = sub ? [groupOf(main, m, 0), groupOf(sub, s, 1)] : [groupOf(main, m, 0)];
					if (unitsOverStock(groups, catalogue).length > 0) continue;
					const e = evaluatePackage(toPackageSpec({ groups }), req);
					if (e.outcome === 'clear' && (best === null || dayCost(groups) < best)) best = dayCost(groups);
				}
	return best;
}

const catalogueArb = fc
	.record({
		mains: fc.array(fc.record({ sens: fc.integer({ min: 94, max: 104 }), rate: fc.integer({ min: 10, max: 90 }), free: fc.integer({ min: 0, max: 4 }) }), { minLength: 1, maxLength: 2 }),
		subs: fc.array(fc.record({ sens: fc.integer({ min: 94, max: 104 }), rate: fc.integer({ min: 10, max: 90 }), free: fc.integer({ min: 0, max: 4 }), pattern: fc.boolean() }), { maxLength: 2 }),
		amps: fc.array(fc.record({ ch: fc.integer({ min: 1, max: 4 }), w: fc.integer({ min: 200, max: 2000 }), rate: fc.integer({ min: 10, max: 90 }), free: fc.integer({ min: 0, max: 3 }) }), { minLength: 1, maxLength: 2 })
	})
	.map(({ mains, subs, amps }): StockCatalogue => {
		const loudspeakers = [...mains.map((m, i) => speaker(i + 1, 'full-range', m.sens, m.rate * 100)), ...subs.map((s, i) => speaker(i + 11, 'subwoofer', s.sens, s.rate * 100))];
		const amplifiers = amps.map((a, i) => amplifier(i + 21, a.ch, a.w, a.rate * 100));
		const available: StockCatalogue['available'] = {};
		mains.forEach((m, i) => (available[`loudspeaker:${i + 1}`] = m.free));
		subs.forEach((s, i) => (available[`loudspeaker:${i + 11}`] = s.free));
		amps.forEach((a, i) => (available[`amplifier:${i + 21}`] = a.free));
		const groupPatterns: StockCatalogue['groupPatterns'] = {};
		subs.forEach((s, i) => s.pattern && (groupPatterns[i + 11] = [{ directivity: rearRejecting, from: 'Test package' }]));
		return { loudspeakers, amplifiers, available, groupPatterns };
	});

describe('suggestSystemsNow', () => {
	it('finds the same cheapest clear system as trying every system, and never more units than are free', () => {
		const seen = { clear: 0, none: 0, pattern: 0 };
		fc.assert(
			fc.property(catalogueArb, fc.integer({ min: 88, max: 106 }), fc.integer({ min: 10, max: 40 }), fc.option(fc.integer({ min: 70, max: 100 })), (catalogue, target, distance, limit) => {
				const req = request(target, distance, limit === null ? undefined : behind(limit));
				const result = suggestSystemsNow(catalogue, req, { budgetMs: 60_000 });
				expect(result.complete).toBe(true);
				const truth = exhaustiveCheapest(catalogue, req);
				expect(result.clear[0]?.dayCostMinor ?? null).toBe(truth);
				seen[truth === null ? 'none' : 'clear']++;
				for (const c of [...result.clear, ...result.closest]) expect(unitsOverStock(c.groups, catalogue)).toEqual([]);
				for (const c of result.clear) expect(c.evaluation.outcome).toBe('clear');
				for (const c of [...result.clear, ...result.closest]) for (const g of c.groups) if (g.directivity) expect(g.count).toBeGreaterThanOrEqual(MIN_PATTERN_CABINETS);
				if (result.clear[0]?.groups.some((g) => g.directivity)) seen.pattern++;
				const costs = result.clear.map((c) => c.dayCostMinor);
				expect(costs).toEqual([...costs].sort((a, b) => a - b));
			}),
			{ numRuns: 120, seed: 12 }
		);
		// Both sides of the question were asked, not only catalogues where nothing can be clear.
		expect(seen.clear).toBeGreaterThan(10);
		expect(seen.none).toBeGreaterThan(5);
		// …and some where the cheapest clear system needs a group pattern.
		expect(seen.pattern).toBeGreaterThan(0);
	});

	it('is deterministic and says what stands in the way when nothing can be clear', () => {
		const catalogue: StockCatalogue = {
			loudspeakers: [speaker(1, 'full-range', 96, 3000)],
			amplifiers: [amplifier(21, 2, 800, 4000)],
			available: { 'loudspeaker:1': 2, 'amplifier:21': 1 }
		};
		const a = suggestSystemsNow(catalogue, request(110, 40));
		const b = suggestSystemsNow(catalogue, request(110, 40));
		expect(a).toEqual(b);
		expect(a.clear).toEqual([]);
		expect(a.closest.length).toBeGreaterThan(0);
		expect(a.obstacles!.bandsShort.length).toBeGreaterThan(0);
		expect(a.obstacles!.modelsRunOut).toContain('Speaker 1');
	});

	it('names the receiver in the way and offers the closest systems when every system meets the level but none keeps the neighbour within its limit', () => {
		const catalogue: StockCatalogue = {
			loudspeakers: [speaker(1, 'full-range', 100, 3000), speaker(11, 'subwoofer', 100, 3000)],
			amplifiers: [amplifier(21, 4, 1200, 4000)],
			available: { 'loudspeaker:1': 4, 'loudspeaker:11': 4, 'amplifier:21': 2 }
		};
		const result = suggestSystemsNow(catalogue, request(95, 20, behind(60)));
		expect(result.clear).toEqual([]);
		expect(result.closest.length).toBeGreaterThan(0);
		expect(result.closest.every((c) => c.evaluation.outcome === 'over-limit')).toBe(true);
		expect(result.obstacles!.bandsShort).toEqual([]);
		expect(result.obstacles!.receiverOver).toMatchObject({ name: 'Behind', maxTargetDb: expect.any(Number) });
		expect(result.obstacles!.receiverOver!.maxTargetDb!).toBeLessThan(95);
	});

	it('offers a subwoofer group pattern of the house when only it keeps the neighbour behind within its limit', () => {
		const catalogue: StockCatalogue = {
			loudspeakers: [speaker(1, 'full-range', 100, 3000), speaker(11, 'subwoofer', 100, 3000)],
			amplifiers: [amplifier(21, 4, 1200, 4000)],
			available: { 'loudspeaker:1': 4, 'loudspeaker:11': 4, 'amplifier:21': 2 },
			groupPatterns: { 11: [{ directivity: rearRejecting, from: 'Test package' }] }
		};
		const without = suggestSystemsNow({ ...catalogue, groupPatterns: {} }, request(95, 20, behind(80)));
		const withPattern = suggestSystemsNow(catalogue, request(95, 20, behind(80)));
		expect(without.clear).toEqual([]);
		expect(withPattern.clear.length).toBeGreaterThan(0);
		const subs = withPattern.clear[0].groups.find((g) => g.loudspeaker.kind === 'subwoofer');
		expect(subs?.directivity).toEqual(rearRejecting);
		expect(subs!.count * subs!.stacks).toBeLessThanOrEqual(4);
	});

	it('stops at its time budget with the best so far', () => {
		const catalogue: StockCatalogue = {
			loudspeakers: [speaker(1, 'full-range', 100, 3000), speaker(11, 'subwoofer', 100, 3000)],
			amplifiers: [amplifier(21, 4, 1200, 4000)],
			available: { 'loudspeaker:1': 8, 'loudspeaker:11': 8, 'amplifier:21': 8 }
		};
		let t = 0;
		const result = suggestSystemsNow(catalogue, request(104, 30), { now: () => (t += 1000), budgetMs: 1500, yieldEvery: 1 });
		expect(result.complete).toBe(false);
	});
});

describe('searchBudgetMs', () => {
	it('gives 2 s to a demo-sized catalogue and 10 s to 40 models, never more', () => {
		expect(searchBudgetMs(11)).toBe(2000);
		expect(searchBudgetMs(15)).toBe(2000);
		expect(searchBudgetMs(40)).toBe(10_000);
		expect(searchBudgetMs(400)).toBe(10_000);
		expect(searchBudgetMs(28)).toBeGreaterThan(2000);
		expect(searchBudgetMs(28)).toBeLessThan(10_000);
	});
});

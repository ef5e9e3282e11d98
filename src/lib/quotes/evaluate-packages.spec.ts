import { describe, expect, it } from 'vitest';
import type { LoadedGroup, LoadedPackage } from '../inventory';
import { evaluatePackages } from './evaluate-packages';
import { toModelRequest } from './request';

// Test fixtures with round figures, not the demo stock.
const stamp = { createdAt: '2027-01-01T00:00:00.000Z', updatedAt: '2027-01-01T00:00:00.000Z' };
const top = {
	id: 1, ...stamp, name: 'Test top', maker: 'Test', kind: 'full-range' as const, sensitivityDb: 100, sensitivityRef: '1W' as const,
	impedanceOhm: 8, powerContinuousW: 500, powerPeakW: 2000, maxSplContinuousDb: null, maxSplPeakDb: null,
	dispersionHDeg: 90, dispersionVDeg: 40, lowHz: 50, highHz: 18000, heightM: null, weightKg: 30, dayRateMinor: 4000,
	replacementValueMinor: 100000, notes: ''
};
const amp = {
	id: 2, ...stamp, name: 'Test amp', maker: 'Test', channels: 2, powerW8: 1000, powerW4: 1600, powerW2: null, minLoadOhm: 4,
	rackUnits: 2, weightKg: 12, dayRateMinor: 5000, replacementValueMinor: 200000, mainsCurrentAmps: 3, notes: ''
};
const group = (count: number): LoadedGroup => ({
	id: 1, position: 0, loudspeakerModelId: 1, count, stacks: 2, amplifierModelId: 2, cabinetsPerChannel: 1, flown: false,
	loudspeaker: top as LoadedGroup['loudspeaker'], amplifier: amp as LoadedGroup['amplifier']
});
const pkg = (id: number, name: string, count: number): LoadedPackage => ({
	id, name, slug: name, description: '', active: true, ...stamp, groups: [group(count)]
});

const input = {
	// 98 dB(A): since acoustics v2 (peaks of 2 × the amplifier rating) the one-top package is tight here, not at 95.
	targetDb: 98, weighting: 'A' as const, distance: 30, distanceUnit: 'm' as const, programme: 'x',
	temperatureC: 20, humidityPct: 50, startDate: '2027-06-12', endDate: '2027-06-13'
};
const programme = { bandsDb: { 125: 0, 250: 0, 500: 0, 1000: 0, 2000: 0, 4000: 0 }, crestFactorDb: 12 };
const priceSettings = { rule: 'daily' as const, taxRateBp: 2000, depositBp: 2500, currency: 'GBP' };

function context(inService: number) {
	return {
		request: toModelRequest(input, programme, 3),
		startDate: input.startDate,
		endDate: input.endDate,
		priceSettings,
		inService: { 'loudspeaker:1': inService, 'amplifier:2': 10 } as const,
		reservations: []
	};
}

describe('evaluatePackages', () => {
	it('ranks by verdict then price and prices the bill of materials', () => {
		const results = evaluatePackages([pkg(10, 'Big', 4), pkg(11, 'Small', 1)], context(20));
		expect(results.map((r) => r.verdict)).toEqual(['clear', 'tight']);
		expect(results.map((r) => r.packageName)).toEqual(['Big', 'Small']);
		const big = results.find((r) => r.packageName === 'Big')!;
		// 8 tops at £40 + 4 amps (8 channels / 2) at £50, for 2 days, +20 % tax, 25 % deposit.
		expect(big.price.subtotalMinor).toBe((8 * 4000 + 4 * 5000) * 2);
		expect(big.price.totalMinor).toBe(124800);
		expect(big.price.depositMinor).toBe(31200);
		expect(big.curve.length).toBeGreaterThan(10);
	});

	it('marks a package short, and says why, when its units are not free on the dates', () => {
		const [result] = evaluatePackages([pkg(10, 'Big', 4)], context(5));
		expect(result.verdict).toBe('short');
		expect(result.limitedBy).toBe('not enough units on those dates');
		expect(result.availability.shortfalls).toEqual([
			{ modelType: 'loudspeaker', modelId: 1, name: 'Test top', needed: 8, available: 5, missing: 3 }
		]);
	});

	it('reports a package the model refuses instead of failing the whole request', () => {
		const wired = pkg(12, 'Miswired', 4);
		wired.groups[0] = { ...wired.groups[0], cabinetsPerChannel: 4 }; // 8 Ω / 4 = 2 Ω below the 4 Ω minimum
		const [result] = evaluatePackages([wired], context(20));
		expect(result.verdict).toBe('short');
		expect(result.error).toMatch(/load below amplifier minimum/);
		expect(result.evaluation).toBeNull();
	});

	it('more cabinets give more headroom (incoherent full-range: +3 dB per doubling)', () => {
		const results = evaluatePackages([pkg(10, 'Four', 4), pkg(11, 'Two', 2)], context(20));
		const four = results.find((r) => r.packageName === 'Four')!;
		const two = results.find((r) => r.packageName === 'Two')!;
		expect(four.headroomDb - two.headroomDb).toBeCloseTo(10 * Math.log10(2), 6);
	});
});

import { describe, expect, it } from 'vitest';
import type { AmplifierModelRow, LoadedGroup, LoudspeakerModelRow } from './types';
import { channelPlanErrors } from './channel-plan';
import { channelsNeeded, packageBillOfMaterials } from './bill-of-materials';
import { toAmplifierSpec, toLoudspeakerSpec, toPackageSpec } from './to-spec';

const stamp = { createdAt: '2026-01-01T00:00:00.000Z', updatedAt: '2026-01-01T00:00:00.000Z' };
const top: LoudspeakerModelRow = { id: 1, name: 'Top', maker: 'M', kind: 'full-range', sensitivityDb: 97, sensitivityRef: '1W', impedanceOhm: 8, powerContinuousW: 500, powerPeakW: null, maxSplContinuousDb: 124, maxSplPeakDb: null, dispersionHDeg: 90, dispersionVDeg: 50, lowHz: 55, highHz: 19000, heightM: null, weightKg: 24.5, dayRateMinor: 3000, replacementValueMinor: 1, notes: '', ...stamp };
const element: LoudspeakerModelRow = { ...top, id: 2, name: 'Element', kind: 'line-array-element', heightM: 0.3, weightKg: 40 };
const sub: LoudspeakerModelRow = { ...top, id: 3, name: 'Sub', kind: 'subwoofer', impedanceOhm: 4, lowHz: 35, highHz: 120, weightKg: 60, dayRateMinor: 5000 };
const quad: AmplifierModelRow = { id: 10, name: 'Four-channel test amplifier', maker: 'M', channels: 4, powerW8: 1000, powerW4: 1800, powerW2: 2400, minLoadOhm: 2, rackUnits: 2, weightKg: 15, dayRateMinor: 4000, replacementValueMinor: 1, mainsCurrentAmps: 5.5, notes: '', ...stamp };
const duo: AmplifierModelRow = { ...quad, id: 11, name: 'Duo', channels: 2, powerW2: null, minLoadOhm: 4, weightKg: 8, dayRateMinor: 2000, mainsCurrentAmps: 2 };

function group(position: number, loudspeaker: LoudspeakerModelRow, amplifier: AmplifierModelRow, count: number, stacks: number, cabinetsPerChannel: number, flown = false): LoadedGroup {
	return { id: position + 100, position, loudspeaker, amplifier, loudspeakerModelId: loudspeaker.id, amplifierModelId: amplifier.id, count, stacks, cabinetsPerChannel, flown };
}

describe('mapping stored rows to the acoustic model', () => {
	it('drops the figures a maker did not give instead of passing null', () => {
		const spec = toLoudspeakerSpec(top);
		expect(spec).toMatchObject({ kind: 'full-range', sensitivityDb: 97, maxSplContinuousDb: 124 });
		expect('powerPeakW' in spec || 'maxSplPeakDb' in spec || 'heightM' in spec).toBe(false);
		expect(toLoudspeakerSpec(element).heightM).toBe(0.3);
	});

	it('maps the three rated powers to powerW {8, 4, 2}, leaving unrated loads out', () => {
		expect(toAmplifierSpec(quad)).toEqual({ channels: 4, powerW: { 8: 1000, 4: 1800, 2: 2400 }, minLoadOhm: 2 });
		expect(toAmplifierSpec(duo).powerW).toEqual({ 8: 1000, 4: 1800 });
	});

	it('gives the groups in package order as GroupSpecs', () => {
		const spec = toPackageSpec({ groups: [group(1, sub, quad, 2, 2, 1), group(0, top, duo, 2, 2, 2)] });
		expect(spec.groups.map((g) => [g.loudspeaker.kind, g.count, g.stacks, g.cabinetsPerChannel])).toEqual([
			['full-range', 2, 2, 2],
			['subwoofer', 2, 2, 1]
		]);
	});
});

describe('packageBillOfMaterials', () => {
	it('counts channels per stack: each stack has its own channels', () => {
		expect(channelsNeeded({ count: 5, stacks: 2, cabinetsPerChannel: 2 })).toBe(6);
	});

	it('shares amplifiers of one model across groups: ceil(Σ stacks·ceil(count/k) / channels)', () => {
		// element: 2 hangs × ceil(9/3)=3 → 6 channels; sub: 2 × ceil(3/1)=3 → 6 channels; 12 channels on 4-channel amps → 3
		const bill = packageBillOfMaterials([group(0, element, quad, 9, 2, 3, true), group(1, sub, quad, 3, 2, 1)]);
		expect(bill.amplifiers).toEqual([{ modelId: 10, name: 'Four-channel test amplifier', maker: 'M', count: 3, channelsUsed: 12 }]);
		expect(bill.loudspeakers).toEqual([
			{ modelId: 2, name: 'Element', maker: 'M', count: 18 },
			{ modelId: 3, name: 'Sub', maker: 'M', count: 6 }
		]);
	});

	it('totals weight, day rate and mains current of cabinets and amplifiers', () => {
		// 4 tops on a duo with 2 per channel: 2 stacks × 1 channel = 2 channels → 1 duo
		const bill = packageBillOfMaterials([group(0, top, duo, 2, 2, 2), group(1, sub, quad, 1, 2, 1)]);
		expect(bill.totalWeightKg).toBe(4 * 24.5 + 2 * 60 + 8 + 15);
		expect(bill.totalDayRateMinor).toBe(4 * 3000 + 2 * 5000 + 2000 + 4000);
		expect(bill.mainsCurrentAmps).toBe(7.5);
		expect(bill.flownHangs).toEqual([]);
	});

	it('gives the cabinet load of each flown hang', () => {
		const bill = packageBillOfMaterials([group(0, element, quad, 12, 2, 3, true)]);
		expect(bill.flownHangs).toEqual([{ group: 0, loudspeakerName: 'Element', hangs: 2, cabinetsPerHang: 12, loadKg: 480 }]);
	});
});

describe('channelPlanErrors', () => {
	it('refuses a parallel load below the amplifier minimum, on cabinetsPerChannel', () => {
		expect(channelPlanErrors([{ count: 4, cabinetsPerChannel: 4, loudspeaker: top, amplifier: duo }])).toHaveProperty(['groups.0.cabinetsPerChannel']);
		expect(channelPlanErrors([{ count: 4, cabinetsPerChannel: 2, loudspeaker: top, amplifier: duo }])).toEqual({});
		expect(channelPlanErrors([{ count: 4, cabinetsPerChannel: 3, loudspeaker: top, amplifier: duo }])['groups.0.cabinetsPerChannel'][0]).toMatch(/2\.67 Ω, below the 4 Ω minimum/);
	});
});

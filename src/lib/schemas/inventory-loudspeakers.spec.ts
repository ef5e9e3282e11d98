import { describe, expect, it } from 'vitest';
import { amplifierSchema } from './inventory-amplifiers';
import { loudspeakerSchema } from './inventory-loudspeakers';
import { packageSchema } from './inventory-packages';
import { stockUnitSchema } from './inventory-units';

const cabinet = {
	name: 'Unit test top',
	maker: 'Nobody',
	kind: 'full-range',
	sensitivityDb: 97,
	sensitivityRef: '1W',
	impedanceOhm: 8,
	powerContinuousW: 500,
	dispersionHDeg: 90,
	dispersionVDeg: 50,
	lowHz: 55,
	highHz: 19000,
	weightKg: 24,
	dayRateMinor: 3000,
	replacementValueMinor: 150000
};

function errorFields(result: { success: boolean; error?: { issues: { path: PropertyKey[] }[] } }): string[] {
	return result.success ? [] : [...new Set(result.error!.issues.map((i) => String(i.path[0])))].sort();
}

describe('loudspeaker schema', () => {
	it('accepts a plausible cabinet and fills the optional fields with null', () => {
		const parsed = loudspeakerSchema.parse(cabinet);
		expect(parsed).toMatchObject({ powerPeakW: null, maxSplPeakDb: null, heightM: null, notes: '' });
	});

	it.each([
		['sensitivityDb', 69.9],
		['sensitivityDb', 120.1],
		['impedanceOhm', 0.5],
		['impedanceOhm', 33],
		['powerContinuousW', 0],
		['powerContinuousW', 20001],
		['dispersionHDeg', 4],
		['dispersionVDeg', 361],
		['lowHz', 9],
		['highHz', 40001],
		['maxSplContinuousDb', 79],
		['maxSplPeakDb', 161],
		['weightKg', 0.05],
		['weightKg', 501],
		['dayRateMinor', -1],
		['dayRateMinor', 12.5]
	])('refuses an implausible %s of %s', (field, value) => {
		expect(errorFields(loudspeakerSchema.safeParse({ ...cabinet, [field]: value }))).toContain(field);
	});

	it('accepts the edges of each range', () => {
		const edges = { sensitivityDb: 70, impedanceOhm: 32, powerContinuousW: 20000, dispersionHDeg: 360, dispersionVDeg: 5, lowHz: 10, highHz: 40000, weightKg: 0.1, dayRateMinor: 0 };
		expect(loudspeakerSchema.safeParse({ ...cabinet, ...edges }).success).toBe(true);
	});

	it('needs lowHz below highHz, reported on highHz', () => {
		expect(errorFields(loudspeakerSchema.safeParse({ ...cabinet, lowHz: 900, highHz: 900, kind: 'subwoofer' }))).toEqual(['highHz']);
	});

	it('keeps a subwoofer’s upper limit at or below 1 kHz and a top’s at or above', () => {
		expect(loudspeakerSchema.safeParse({ ...cabinet, kind: 'subwoofer', lowHz: 35, highHz: 150 }).success).toBe(true);
		expect(errorFields(loudspeakerSchema.safeParse({ ...cabinet, kind: 'subwoofer', lowHz: 35, highHz: 2000 }))).toEqual(['highHz']);
		expect(errorFields(loudspeakerSchema.safeParse({ ...cabinet, highHz: 150 }))).toEqual(['highHz']);
	});

	it('requires heightM (0.05–2 m) for a line-array element only', () => {
		const element = { ...cabinet, kind: 'line-array-element' };
		expect(errorFields(loudspeakerSchema.safeParse(element))).toEqual(['heightM']);
		expect(errorFields(loudspeakerSchema.safeParse({ ...element, heightM: 2.5 }))).toEqual(['heightM']);
		expect(loudspeakerSchema.safeParse({ ...element, heightM: 0.38 }).success).toBe(true);
		expect(loudspeakerSchema.safeParse(cabinet).success).toBe(true);
	});

	it('peak figures cannot sit below the continuous ones', () => {
		const result = loudspeakerSchema.safeParse({ ...cabinet, powerPeakW: 400, maxSplContinuousDb: 125, maxSplPeakDb: 120 });
		expect(errorFields(result)).toEqual(['maxSplPeakDb', 'powerPeakW']);
	});
});

describe('amplifier schema', () => {
	const amp = { name: 'A', maker: 'B', channels: 4, powerW8: 1000, powerW4: 1800, powerW2: null, minLoadOhm: 4, rackUnits: 2, weightKg: 14, dayRateMinor: 3000, replacementValueMinor: 200000, mainsCurrentAmps: 4.5 };
	it('accepts a plausible amplifier', () => expect(amplifierSchema.safeParse(amp).success).toBe(true));
	it('needs a power rating at one load at least', () => {
		expect(errorFields(amplifierSchema.safeParse({ ...amp, powerW8: null, powerW4: null }))).toEqual(['powerW8']);
	});
	it('refuses a rating below its own minimum load', () => {
		expect(errorFields(amplifierSchema.safeParse({ ...amp, powerW2: 2000 }))).toEqual(['minLoadOhm']);
	});
	it('refuses fractional channels and out-of-range power', () => {
		expect(errorFields(amplifierSchema.safeParse({ ...amp, channels: 2.5, powerW8: 25000 }))).toEqual(['channels', 'powerW8']);
	});
});

describe('package and stock unit schemas', () => {
	const group = { loudspeakerModelId: 1, count: 2, amplifierModelId: 2, cabinetsPerChannel: 2 };
	it('defaults stacks to 1 and flown to false', () => {
		expect(packageSchema.parse({ name: 'P', slug: 'p-1', groups: [group] }).groups[0]).toMatchObject({ stacks: 1, flown: false });
	});
	it('needs a group, a tidy slug, and no more cabinets per channel than the group has', () => {
		const result = packageSchema.safeParse({ name: 'P', slug: 'Not A Slug', groups: [{ ...group, cabinetsPerChannel: 3 }] });
		expect(result.success).toBe(false);
		const paths = result.error!.issues.map((i) => i.path.join('.'));
		expect(paths.sort()).toEqual(['groups.0.cabinetsPerChannel', 'slug']);
		expect(packageSchema.safeParse({ name: 'P', slug: 'p', groups: [] }).success).toBe(false);
	});
	it('a stock unit has a serial without spaces and an ISO date or none', () => {
		const unit = { serial: 'SN-0001', modelType: 'amplifier', modelId: 3 };
		expect(stockUnitSchema.parse(unit)).toMatchObject({ status: 'ready', lastTestedAt: null });
		expect(errorFields(stockUnitSchema.safeParse({ ...unit, serial: 'has space', lastTestedAt: '14/03/2026' }))).toEqual(['lastTestedAt', 'serial']);
	});
});

describe('PATCH schemas', () => {
	it('leave out what the body leaves out (no defaults that would wipe a stored figure) and refuse unknown keys', async () => {
		const { loudspeakerPatchSchema } = await import('./inventory-loudspeakers');
		const { amplifierPatchSchema } = await import('./inventory-amplifiers');
		expect(loudspeakerPatchSchema.parse({ sensitivityDb: 98 })).toEqual({ sensitivityDb: 98 });
		expect(amplifierPatchSchema.parse({ notes: 'x' })).toEqual({ notes: 'x' });
		expect(amplifierPatchSchema.parse({ powerW2: null })).toEqual({ powerW2: null });
		expect(loudspeakerPatchSchema.safeParse({ sensitivityDb: 200 }).success).toBe(false);
		expect(loudspeakerPatchSchema.safeParse({ colour: 'red' }).success).toBe(false);
	});
});

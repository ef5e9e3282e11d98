import { describe, expect, it } from 'vitest';
import { fieldErrors } from '$lib/server/services/errors';
import { bandResponseSchema, compressionSchema, directivitySchema } from './directivity';
import { loudspeakerSchema } from './inventory-loudspeakers';
import { packageSchema } from './inventory-packages';

// Test tables: the contract's rules (shared/acoustics.md, Inputs: ascending angles 0 … 180, one value ≥ 0 per angle).
const angles = [0, 45, 90, 135, 180];
const good = { anglesDeg: angles, bandsDb: { '125': [0, 1, 2, 3, 4], '1000': [0, 3, 8, 14, 18] } };

function errorsOf(value: unknown): Record<string, string[]> {
	const result = directivitySchema.safeParse(value);
	return result.success ? {} : fieldErrors(result.error.issues);
}

describe('directivity table schema', () => {
	it('accepts a table whose angles run 0 … 180 ascending with one value ≥ 0 per angle', () => {
		expect(directivitySchema.parse(good)).toEqual(good);
		expect(directivitySchema.parse({ anglesDeg: [0, 180], bandsDb: { '31.5': [0, 0] } })).toBeTruthy();
	});

	it('refuses angles that do not start at 0, end at 180 or ascend', () => {
		expect(errorsOf({ ...good, anglesDeg: [10, 45, 90, 135, 180] }).anglesDeg).toEqual(['The first angle must be 0° (on axis)']);
		expect(errorsOf({ ...good, anglesDeg: [0, 45, 90, 135, 170] }).anglesDeg).toEqual(['The last angle must be 180° (behind)']);
		expect(errorsOf({ ...good, anglesDeg: [0, 90, 45, 135, 180] }).anglesDeg).toEqual(['Angles must ascend: 45° follows 90°']);
		expect(errorsOf({ ...good, anglesDeg: [0, 90, 90, 135, 180] }).anglesDeg).toHaveLength(1);
		expect(errorsOf({ anglesDeg: [0], bandsDb: { '63': [0] } }).anglesDeg).toBeTruthy();
	});

	it('names the band whose row has the wrong length', () => {
		const errors = errorsOf({ ...good, bandsDb: { ...good.bandsDb, '4000': [0, 5, 10] } });
		expect(Object.keys(errors)).toEqual(['bandsDb.4000']);
		expect(errors['bandsDb.4000'][0]).toMatch(/^4 kHz: 3 values for 5 angles/);
	});

	it('refuses negative attenuation, non-numbers, unknown bands and a table without rows', () => {
		expect(errorsOf({ ...good, bandsDb: { '125': [0, -1, 2, 3, 4] } })['bandsDb.125.1']).toEqual(['125 Hz at 45°: attenuation is 0 dB or more']);
		expect(errorsOf({ ...good, bandsDb: { '125': [0, Number.NaN, 2, 3, 4] } })).toHaveProperty(['bandsDb.125.1']);
		expect(Object.keys(errorsOf({ ...good, bandsDb: { '100': [0, 1, 2, 3, 4] } }))).toEqual(['bandsDb']);
		expect(errorsOf({ ...good, bandsDb: {} }).bandsDb).toEqual(['Give at least one band row']);
	});
});

describe('band response and compression', () => {
	it('takes only the nine octave bands; null means not given', () => {
		expect(bandResponseSchema.parse({ '31.5': -12, '63': -3, '125': 0 })).toEqual({ '31.5': -12, '63': -3, '125': 0 });
		expect(bandResponseSchema.parse(null)).toBeNull();
		expect(bandResponseSchema.safeParse({ '16': -20 }).success).toBe(false);
		expect(bandResponseSchema.safeParse({ '63': 'loud' }).success).toBe(false);
	});

	it('compression is 0 dB or more', () => {
		expect(compressionSchema.parse(1.5)).toBe(1.5);
		expect(compressionSchema.safeParse(-0.5).success).toBe(false);
	});
});

describe('the v2 fields on loudspeakers and package groups', () => {
	const cabinet = {
		name: 'Unit test top', maker: 'Nobody', kind: 'full-range', sensitivityDb: 97, sensitivityRef: '1W', impedanceOhm: 8,
		powerContinuousW: 500, dispersionHDeg: 90, dispersionVDeg: 50, lowHz: 55, highHz: 19000, weightKg: 24, dayRateMinor: 3000, replacementValueMinor: 150000
	};
	const group = { loudspeakerModelId: 1, count: 2, stacks: 2, amplifierModelId: 1, cabinetsPerChannel: 1 };

	it('a loudspeaker carries its response, compression and table; a bad row is an error at the band', () => {
		const parsed = loudspeakerSchema.parse({ ...cabinet, bandResponseDb: { '63': -6 }, compressionDb: 2, directivity: good });
		expect(parsed).toMatchObject({ bandResponseDb: { '63': -6 }, compressionDb: 2, directivity: good });
		const bad = loudspeakerSchema.safeParse({ ...cabinet, directivity: { ...good, bandsDb: { '250': [0, 1] } } });
		expect(bad.success ? {} : fieldErrors(bad.error.issues)).toHaveProperty(['directivity.bandsDb.250']);
	});

	it('a group takes height, spacing (≥ 0) and an optional pattern', () => {
		const pkg = { name: 'P', slug: 'p-test', groups: [{ ...group, heightM: 0.6, spacingM: 12, directivity: good }] };
		expect(packageSchema.parse(pkg).groups[0]).toMatchObject({ heightM: 0.6, spacingM: 12, directivity: good });
		const bad = packageSchema.safeParse({ ...pkg, groups: [{ ...group, heightM: -1, spacingM: -2 }] });
		expect(bad.success ? [] : Object.keys(fieldErrors(bad.error.issues)).sort()).toEqual(['groups.0.heightM', 'groups.0.spacingM']);
	});
});

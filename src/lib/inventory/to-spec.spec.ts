import { describe, expect, it } from 'vitest';
import type { AmplifierModelRow, LoadedGroup, LoudspeakerModelRow } from './types';
import { toLoudspeakerSpec, toPackageSpec } from './to-spec';

// Test rows, not demo data.
const stamp = { createdAt: '2026-01-01T00:00:00.000Z', updatedAt: '2026-01-01T00:00:00.000Z' };
const top: LoudspeakerModelRow = { id: 1, name: 'Top', maker: 'M', kind: 'full-range', sensitivityDb: 97, sensitivityRef: '1W', impedanceOhm: 8, powerContinuousW: 500, powerPeakW: null, maxSplContinuousDb: null, maxSplPeakDb: null, dispersionHDeg: 90, dispersionVDeg: 50, lowHz: 55, highHz: 19000, heightM: null, weightKg: 24.5, dayRateMinor: 3000, replacementValueMinor: 1, notes: '', ...stamp };
const amp: AmplifierModelRow = { id: 10, name: 'A', maker: 'M', channels: 4, powerW8: 1000, powerW4: 1800, powerW2: null, minLoadOhm: 4, rackUnits: 2, weightKg: 15, dayRateMinor: 4000, replacementValueMinor: 1, mainsCurrentAmps: 5.5, notes: '', ...stamp };
const table = { anglesDeg: [0, 90, 180], bandsDb: { '31.5': [0, 1, 2], '1000': [0, 6, 15] } };
const group = (extra: Partial<LoadedGroup>): LoadedGroup => ({ id: 1, position: 0, loudspeaker: top, amplifier: amp, loudspeakerModelId: 1, amplifierModelId: 10, count: 2, stacks: 2, cabinetsPerChannel: 1, flown: false, ...extra });

describe('v2 gear data in the model’s input shapes', () => {
	it('passes band response, compression and directivity with numeric band keys', () => {
		const spec = toLoudspeakerSpec({ ...top, bandResponseDb: { '31.5': -15, '63': -3 }, compressionDb: 1.5, directivity: table });
		expect(spec.bandResponseDb).toEqual({ 31.5: -15, 63: -3 });
		expect(spec.compressionDb).toBe(1.5);
		expect(spec.directivity).toEqual({ anglesDeg: [0, 90, 180], bandsDb: { 31.5: [0, 1, 2], 1000: [0, 6, 15] } });
	});

	it('omits what was not given (null, absent or an empty response)', () => {
		for (const row of [top, { ...top, bandResponseDb: null, compressionDb: null, directivity: null }, { ...top, bandResponseDb: {} }]) {
			const spec = toLoudspeakerSpec(row);
			expect(['bandResponseDb', 'compressionDb', 'directivity'].filter((k) => k in spec)).toEqual([]);
		}
	});

	it('passes a group’s height, spacing and own pattern, omitting absent ones', () => {
		const [placed] = toPackageSpec({ groups: [group({ heightM: 0.6, spacingM: 14, directivity: table })] }).groups;
		expect(placed).toMatchObject({ heightM: 0.6, spacingM: 14, directivity: { anglesDeg: [0, 90, 180], bandsDb: { 1000: [0, 6, 15] } } });
		const [plain] = toPackageSpec({ groups: [group({ heightM: null, spacingM: null, directivity: null })] }).groups;
		expect(['heightM', 'spacingM', 'directivity'].filter((k) => k in plain)).toEqual([]);
	});
});

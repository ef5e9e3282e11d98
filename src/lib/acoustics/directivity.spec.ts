// Contract step 3b, directivity: table rules and the cautious default.
import { describe, expect, it } from 'vitest';
import { group } from '../../../tests/helpers/acoustics/fixtures';
import { directivityDb } from './directivity';
import { AcousticsInputError } from './errors';
import type { Directivity } from './types';

const ANGLES = [0, 30, 60, 90, 120, 150, 180];
const table: Directivity = {
	anglesDeg: ANGLES,
	bandsDb: {
		125: [0, 1, 2, 4, 6, 8, 10],
		1000: [0, 2, 6, 12, 18, 22, 24]
	}
};

describe('directivityDb with a table', () => {
	const withTable = group({}, { directivity: table });

	it('reads the band row at the table angles', () => {
		expect(directivityDb(withTable, 1000, 0)).toBe(0);
		expect(directivityDb(withTable, 1000, 90)).toBe(12);
		expect(directivityDb(withTable, 125, 180)).toBe(10);
	});

	it('is linear in angle between the table angles (45° is half-way from 2 to 6 dB)', () => {
		expect(directivityDb(withTable, 1000, 45)).toBeCloseTo(4, 12);
		expect(directivityDb(withTable, 1000, 100)).toBeCloseTo(12 + (6 * 10) / 30, 12);
		expect(directivityDb(withTable, 125, 165)).toBeCloseTo(9, 12);
	});

	it('a band without a row uses the nearest band present below it (2 kHz → 1 kHz, 500 → 125 Hz)', () => {
		expect(directivityDb(withTable, 2000, 90)).toBe(12);
		expect(directivityDb(withTable, 8000, 60)).toBe(6);
		expect(directivityDb(withTable, 500, 90)).toBe(4);
	});

	it('a band below every row uses the lowest row present (63 and 31.5 Hz → 125 Hz)', () => {
		expect(directivityDb(withTable, 63, 120)).toBe(6);
		expect(directivityDb(withTable, 31.5, 120)).toBe(6);
	});

	it("the group's own pattern overrides the loudspeaker's (e.g. a cardioid sub arrangement)", () => {
		const cardioid: Directivity = { anglesDeg: [0, 180], bandsDb: { 63: [0, 20] } };
		const subs = group({ directivity: cardioid }, { kind: 'subwoofer', directivity: table });
		expect(directivityDb(subs, 63, 180)).toBe(20);
		expect(directivityDb(subs, 63, 90)).toBe(10);
	});

	it('angles outside 0 … 180° fold by symmetry: −45° and 315° read as 45°, 270° as 90°', () => {
		expect(directivityDb(withTable, 1000, -45)).toBeCloseTo(4, 12);
		expect(directivityDb(withTable, 1000, 315)).toBeCloseTo(4, 12);
		expect(directivityDb(withTable, 1000, 270)).toBeCloseTo(12, 12);
	});

	it('a table with no band rows carries no data: the default pattern applies', () => {
		const empty = group({}, { directivity: { anglesDeg: [0, 180], bandsDb: {} } });
		expect(directivityDb(empty, 1000, 45)).toBe(directivityDb(group(), 1000, 45));
	});
});

describe('directivityDb default (no table): deliberately cautious', () => {
	it('full-range 90°: 6·(2φ/90)², so −6 dB at the ±45° coverage edge', () => {
		expect(directivityDb(group(), 1000, 45)).toBeCloseTo(6, 12);
		expect(directivityDb(group(), 1000, 0)).toBe(0);
		expect(directivityDb(group(), 4000, 30)).toBeCloseTo(6 * (60 / 90) ** 2, 12);
	});

	it('capped at the rear limit R = 0, 0, 0, 3, 6, 10, 12, 15, 15 dB for 31.5 … 8000 Hz', () => {
		const rear = [0, 0, 0, 3, 6, 10, 12, 15, 15];
		[31.5, 63, 125, 250, 500, 1000, 2000, 4000, 8000].forEach((band, i) =>
			expect(directivityDb(group(), band, 180)).toBe(rear[i])
		);
	});

	it('subwoofers and dispersion ≥ 360° give 0 at every angle', () => {
		expect(directivityDb(group({}, { kind: 'subwoofer' }), 63, 180)).toBe(0);
		expect(directivityDb(group({}, { dispersionHDeg: 360 }), 8000, 180)).toBe(0);
	});
});

describe('directivity tables that cannot be used', () => {
	const bad = (directivity: Directivity) => () =>
		directivityDb(group({}, { directivity }), 1000, 0);

	it('angles that do not start at 0, end at 180 or ascend', () => {
		expect(bad({ anglesDeg: [10, 180], bandsDb: { 1000: [0, 1] } })).toThrow(
			/angles must start at 0° and end at 180°/
		);
		expect(bad({ anglesDeg: [0, 90], bandsDb: { 1000: [0, 1] } })).toThrow(AcousticsInputError);
		expect(bad({ anglesDeg: [0, 90, 60, 180], bandsDb: { 1000: [0, 1, 2, 3] } })).toThrow(
			/angles must ascend \(got 90° then 60°\)/
		);
		expect(bad({ anglesDeg: [0, 90, 90, 180], bandsDb: { 1000: [0, 1, 2, 3] } })).toThrow(
			/angles must ascend/
		);
	});

	it('a row with the wrong number of values, a value that is not a number, or a band the model lacks', () => {
		expect(bad({ anglesDeg: [0, 90, 180], bandsDb: { 1000: [0, 6] } })).toThrow(
			/the 1000 Hz row has 2 values but there are 3 angles/
		);
		expect(bad({ anglesDeg: [0, 180], bandsDb: { 1000: [0, Number.NaN] } })).toThrow(
			/1000 Hz at 180°/
		);
		const odd = { anglesDeg: [0, 180], bandsDb: { 16000: [0, 1] } } as unknown as Directivity;
		expect(bad(odd)).toThrow(/band "16000" is not one of the model's octave bands/);
	});
});

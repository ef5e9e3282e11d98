import { describe, expect, it } from 'vitest';
import { airAbsorption } from './absorption';
import { MODEL_ASSUMPTIONS } from './assumptions';
import { levelAtDistance, levelCurve } from './curve';
import { evaluatePackage } from './evaluate';
import { levelGrid } from './grid';
import { FLAT_OCTAVES, group, request } from '../../../tests/helpers/acoustics/fixtures';
import { feetToMetres } from './units';
import type { PackageSpec } from './types';

const tops: PackageSpec = { groups: [group({ stacks: 2 }, { lowHz: 25 })] };
const subsAndHang: PackageSpec = {
	groups: [
		group({ count: 4, stacks: 2 }, { kind: 'subwoofer', lowHz: 25, highHz: 130 }),
		group({ count: 8, stacks: 2 }, { kind: 'line-array-element', heightM: 0.4 })
	]
};

describe('levelCurve / levelAtDistance: the package driven as in contract step 8', () => {
	it('passes through the target at the position, in the request weighting', () => {
		for (const pkg of [tops, subsAndHang]) {
			const r = request({ targetDb: 98, weighting: 'A', distanceM: 25, programme: FLAT_OCTAVES });
			expect(levelAtDistance(pkg, r, 25).A).toBeCloseTo(98, 10);
		}
	});

	it('passes through the boundary prediction of evaluatePackage, in every weighting', () => {
		for (const weighting of ['A', 'C', 'Z'] as const) {
			const r = request({
				targetDb: 98,
				weighting: 'A',
				distanceM: 25,
				programme: FLAT_OCTAVES,
				boundary: { distanceM: 400, limitDb: 65, weighting }
			});
			const boundary = evaluatePackage(subsAndHang, r).boundary!;
			expect(levelAtDistance(subsAndHang, r, 400)[weighting]).toBeCloseTo(boundary.predictedDb, 10);
		}
	});

	it('common practice: −6 dB per doubling from a point source (1 kHz, plus ISO 9613-1 absorption)', () => {
		const r = request({ targetDb: 85, weighting: 'Z', distanceM: feetToMetres(50) });
		const [at50ft, at100ft] = levelCurve(tops, r, [feetToMetres(50), feetToMetres(100)]);
		const alpha = airAbsorption(1000, r.air);
		expect(at50ft.levels.Z - at100ft.levels.Z).toBeCloseTo(
			20 * Math.log10(2) + alpha * feetToMetres(50),
			10
		);
		expect(at50ft.distanceM).toBe(feetToMetres(50));
	});

	it('common practice: a line array loses about 3 dB per doubling inside its transition, 6 dB beyond (1 kHz)', () => {
		const hang: PackageSpec = {
			groups: [group({ count: 10 }, { kind: 'line-array-element', heightM: 0.4 })]
		}; // 4 m, d_t ≈ 23.3 m
		const r = request({ distanceM: 20 });
		const [at4, at8, at50, at100] = levelCurve(hang, r, [4, 8, 50, 100]).map((p) => p.levels.Z);
		const alpha = airAbsorption(1000, r.air);
		expect(at4 - at8).toBeCloseTo(10 * Math.log10(2) + alpha * 4, 10);
		expect(at50 - at100).toBeCloseTo(20 * Math.log10(2) + alpha * 50, 10);
	});

	it('is −Infinity where the package covers no programme band, and rejects bad distances', () => {
		const onlyLow = request({ programme: { bandsDb: { 31.5: 0 }, crestFactorDb: 6 } });
		expect(levelAtDistance({ groups: [group()] }, onlyLow, 10).Z).toBe(-Infinity);
		expect(() => levelCurve(tops, request(), [10, 0])).toThrow(
			/Chart distance must be a positive, finite number of metres/
		);
	});
});

describe('levelCurve is the v2 model on axis without a site', () => {
	const r = request({ targetDb: 98, weighting: 'A', distanceM: 25, programme: FLAT_OCTAVES });

	it('equals levelGrid along the axis of an unsited grid (aim north, heights equal, no ground)', () => {
		const grid = levelGrid(subsAndHang, r, {
			xMinM: 0,
			xMaxM: 0,
			yMinM: 5,
			yMaxM: 405,
			stepM: 50,
			weighting: 'A'
		});
		const curve = levelCurve(
			subsAndHang,
			r,
			Array.from({ length: grid.ny }, (_, j) => 5 + 50 * j)
		);
		curve.forEach((point, j) => expect(grid.levels[j]).toBeCloseTo(point.levels.A, 9));
	});

	it("ignores the request's site (the chart stays the free-field axis)", () => {
		const site = { aimDeg: 90, groundFactor: 1, allowanceDb: 6, receivers: [] };
		expect(levelAtDistance(subsAndHang, { ...r, site }, 200)).toEqual(
			levelAtDistance(subsAndHang, r, 200)
		);
	});
});

describe('MODEL_ASSUMPTIONS', () => {
	it('states every caveat the UI must show beside a prediction', () => {
		const text = MODEL_ASSUMPTIONS.join(' ');
		for (const phrase of [
			/free field/i,
			/measure on site/i,
			/wind and temperature inversion/i,
			/noise regulations/i,
			/licensing/i,
			/hearing-safety/i,
			/line arrays/i,
			/factor of two/i,
			/off the centreline/i,
			/ISO 9613-2/,
			/downwind/i,
			/deliberately cautious/i,
			/polar data/i,
			/barriers, buildings, reflections, delay towers and curved-array/i,
			/more than the allowance/i,
			/licensed practice/i
		]) {
			expect(text).toMatch(phrase);
		}
		expect(Object.isFrozen(MODEL_ASSUMPTIONS)).toBe(true);
	});
});

// Contract step 10: levelGrid.
import { describe, expect, it } from 'vitest';
import { group, request } from '../../../tests/helpers/acoustics/fixtures';
import { airAbsorption } from './absorption';
import { evaluatePackage } from './evaluate';
import { levelGrid } from './grid';
import type { Grid, Site } from './types';

const AIR = { temperatureC: 20, humidityPct: 70 };
const pkg = { groups: [group()] };
const grid = (overrides: Partial<Grid> = {}): Grid => ({
	xMinM: -100,
	yMinM: -100,
	xMaxM: 100,
	yMaxM: 100,
	stepM: 10,
	weighting: 'Z',
	...overrides
});

describe('levelGrid', () => {
	it('x = xMin + i·step for i = 0 … ⌊(xMax − xMin)/step⌋, likewise y, row by row from yMin', () => {
		const g = levelGrid(pkg, request(), grid({ xMaxM: 105, yMinM: 0, yMaxM: 50 }));
		expect([g.nx, g.ny, g.levels.length]).toEqual([21, 6, 126]);
		// Row j = 5 (y = 50), column i = 10 (x = 0): on axis 50 m out, 90 dB(Z) at 10 m → 90 − 20·lg 5 − α·40.
		expect(g.levels[5 * 21 + 10]).toBeCloseTo(
			90 - 20 * Math.log10(5) - airAbsorption(1000, AIR) * 40,
			9
		);
	});

	it('keeps the last point when (max − min)/step is whole but rounds below it (0.3 / 0.1)', () => {
		const g = levelGrid(
			pkg,
			request(),
			grid({ xMinM: 0, xMaxM: 0.3, yMinM: 0, yMaxM: 0.3, stepM: 0.1 })
		);
		expect([g.nx, g.ny]).toEqual([4, 4]);
	});

	it('without a site: aim north, no ground, no allowance — directivity applies (behind is quieter)', () => {
		const g = levelGrid(
			pkg,
			request(),
			grid({ xMinM: 0, xMaxM: 0, yMinM: -50, yMaxM: 50, stepM: 100 })
		);
		// Default 90° pattern at 1 kHz: rear limit 10 dB.
		expect(g.levels[1] - g.levels[0]).toBeCloseTo(10, 9);
	});

	it('uses the site when given: allowance added, aim turns the pattern', () => {
		const site: Site = { aimDeg: 180, groundFactor: null, allowanceDb: 4, receivers: [] };
		const plain = levelGrid(
			pkg,
			request(),
			grid({ xMinM: 0, xMaxM: 0, yMinM: -50, yMaxM: 50, stepM: 100 })
		);
		const turned = levelGrid(
			pkg,
			request({ site }),
			grid({ xMinM: 0, xMaxM: 0, yMinM: -50, yMaxM: 50, stepM: 100 })
		);
		expect(turned.levels[0]).toBeCloseTo(plain.levels[1] + 4, 9);
	});

	it('NaN where no band has a level (the package covers none of the programme bands)', () => {
		const g = levelGrid({ groups: [group({}, { lowHz: 2000 })] }, request(), grid());
		expect(g.levels.every(Number.isNaN)).toBe(true);
		expect(levelGrid({ groups: [] }, request(), grid()).levels.every(Number.isNaN)).toBe(true);
	});

	it('at a receiver’s point the grid gives that receiver’s prediction', () => {
		const site: Site = {
			aimDeg: 30,
			groundFactor: 0.7,
			allowanceDb: 2,
			receivers: [{ name: 'School', x: 40, y: -30, heightM: 4, limitDb: 60, weighting: 'A' }]
		};
		const r = evaluatePackage(pkg, request({ site, weighting: 'A' })).receivers[0].predictedDb!;
		const g = levelGrid(
			pkg,
			request({ site, weighting: 'A' }),
			grid({ heightM: 4, weighting: 'A' })
		);
		expect(g.levels[7 * g.nx + 14]).toBe(r);
	});

	it('refuses a step ≤ 0, more than 250 000 points, an inverted range or an unknown weighting', () => {
		expect(() => levelGrid(pkg, request(), grid({ stepM: 0 }))).toThrow(
			/Grid step must be greater than zero/
		);
		expect(() => levelGrid(pkg, request(), grid({ stepM: -1 }))).toThrow(/Grid step/);
		expect(() => levelGrid(pkg, request(), grid({ stepM: 0.3 }))).toThrow(
			/667 × 667 = 444889 points, more than 250,000/
		);
		expect(
			levelGrid(pkg, request(), grid({ xMaxM: 399, yMaxM: 399, stepM: 1 })).levels.length
		).toBe(250_000);
		expect(() => levelGrid(pkg, request(), grid({ xMaxM: -200 }))).toThrow(
			/xMaxM \(-200\) is below xMinM/
		);
		expect(() => levelGrid(pkg, request(), grid({ weighting: 'B' as 'A' }))).toThrow(
			/unknown weighting/
		);
		expect(() => levelGrid(pkg, request(), grid({ heightM: -2 }))).toThrow(
			/Grid height \(m\) cannot be negative/
		);
	});
});

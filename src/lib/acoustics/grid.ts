/**
 * levelGrid (contract step 10): the level a receiver would be predicted at every point of a
 * rectangular grid, for maps. x = xMin + i·step (i = 0 … ⌊(xMax − xMin)/step⌋), likewise y, row by
 * row from yMin; NaN where no band has a level. Without a site the grid uses aim 0°, no ground
 * term and no allowance (directivity and group heights still apply).
 */
import { fail, requireFinite } from './errors';
import { offAxisDeg } from './geometry';
import { drivePackage } from './drive';
import { preparePackage } from './groups';
import { drivenLevelAt } from './receivers';
import { checkRequest } from './requirement';
import { GRID_DEFAULT_SITE, checkHeight, checkSite } from './site';
import { assertWeighting } from './weighting';
import type { Grid, LevelGrid, PackageSpec, QuoteRequest } from './types';

export const MAX_GRID_POINTS = 250_000;

/**
 * Points along one axis. A relative tolerance of 1e-9 on the quotient keeps the last point when
 * (max − min)/step is a whole number spoilt by rounding (0.3 / 0.1 = 2.9999999999999996 → 4 points).
 */
function pointsAlong(min: number, max: number, step: number, axis: 'x' | 'y'): number {
	if (max < min) fail(`Grid ${axis}MaxM (${max}) is below ${axis}MinM (${min}).`);
	const steps = (max - min) / step;
	return Math.floor(steps + steps * 1e-9 + 1e-9) + 1;
}

export function checkGrid(grid: Grid): { nx: number; ny: number; heightM: number } {
	if (grid === null || typeof grid !== 'object')
		fail('Grid must give xMinM, yMinM, xMaxM, yMaxM, stepM and weighting.');
	const xMin = requireFinite(grid.xMinM, 'Grid xMinM (m)');
	const yMin = requireFinite(grid.yMinM, 'Grid yMinM (m)');
	const xMax = requireFinite(grid.xMaxM, 'Grid xMaxM (m)');
	const yMax = requireFinite(grid.yMaxM, 'Grid yMaxM (m)');
	const step = requireFinite(grid.stepM, 'Grid step (m)');
	if (step <= 0) fail(`Grid step must be greater than zero (got ${step} m).`);
	assertWeighting(grid.weighting, 'Grid');
	const nx = pointsAlong(xMin, xMax, step, 'x');
	const ny = pointsAlong(yMin, yMax, step, 'y');
	if (nx * ny > MAX_GRID_POINTS)
		fail(
			`Grid has ${nx} × ${ny} = ${nx * ny} points, more than ${MAX_GRID_POINTS.toLocaleString('en-GB')}; use a larger step or a smaller area.`
		);
	return { nx, ny, heightM: checkHeight(grid.heightM, 'Grid height (m)') };
}

export function levelGrid(pkg: PackageSpec, request: QuoteRequest, grid: Grid): LevelGrid {
	checkRequest(request);
	const site = request.site === undefined ? GRID_DEFAULT_SITE : checkSite(request.site);
	const { nx, ny, heightM } = checkGrid(grid);
	const groups = preparePackage(pkg).groups;
	const driven = drivePackage(preparePackage(pkg), request, site);
	const levels = new Float64Array(nx * ny);
	const allowance = site.allowanceDb;
	let k = 0;
	for (let j = 0; j < ny; j++) {
		const y = grid.yMinM + j * grid.stepM;
		for (let i = 0; i < nx; i++) {
			const x = grid.xMinM + i * grid.stepM;
			const level = drivenLevelAt(
				groups,
				driven,
				Math.sqrt(x * x + y * y),
				offAxisDeg(x, y, site.aimDeg),
				heightM,
				grid.weighting
			) as number;
			levels[k++] = level === -Infinity ? Number.NaN : level + allowance;
		}
	}
	return { nx, ny, levels };
}

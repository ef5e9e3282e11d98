/**
 * The grid the level map asks the model for: about 100 × 100 points over the plan's visible extent
 * (contract: `levelGrid`, shared/acoustics.md step 10), never more than the model's 250 000 points.
 * Grid points start at the extent's corner and reach (or just pass) its far edges, so the map covers
 * all the plan shows; the model refuses grids over MAX_GRID_POINTS.
 */
import { MAX_GRID_POINTS, type Grid, type Weighting } from '../acoustics';
import type { PlanExtent } from './extent';

/** Points along the longer side: 100 × 100 redraws well over 10 times a second in a browser. */
export const DEFAULT_POINTS_PER_SIDE = 100;

export function gridSpec(
	extent: PlanExtent,
	weighting: Weighting,
	options: { pointsPerSide?: number; heightM?: number } = {}
): Grid {
	const width = extent.xMaxM - extent.xMinM;
	const height = extent.yMaxM - extent.yMinM;
	if (!(width > 0 && height > 0)) throw new RangeError('The plan extent must have a positive size');
	const perSide = Math.max(2, Math.min(Math.floor(options.pointsPerSide ?? DEFAULT_POINTS_PER_SIDE), Math.floor(Math.sqrt(MAX_GRID_POINTS))));
	// perSide points span perSide − 1 steps on the longer side.
	const stepM = Math.max(width, height) / (perSide - 1);
	// Enough steps to reach (or just pass) each far edge, so the map covers all the plan shows;
	// a hair more so floating point never drops the last column or row.
	const stepsX = Math.ceil(width / stepM - 1e-9);
	const stepsY = Math.ceil(height / stepM - 1e-9);
	const grid: Grid = {
		xMinM: extent.xMinM,
		yMinM: extent.yMinM,
		xMaxM: extent.xMinM + (stepsX + 1e-6) * stepM,
		yMaxM: extent.yMinM + (stepsY + 1e-6) * stepM,
		stepM,
		weighting
	};
	if (options.heightM !== undefined) grid.heightM = options.heightM;
	return grid;
}

/** Grid points per side, as the model counts them: i = 0 … ⌊(max − min)/step⌋. */
export function gridSize(grid: Grid): { nx: number; ny: number } {
	return {
		nx: Math.floor((grid.xMaxM - grid.xMinM) / grid.stepM) + 1,
		ny: Math.floor((grid.yMaxM - grid.yMinM) / grid.stepM) + 1
	};
}

export function gridPointCount(grid: Grid): number {
	const { nx, ny } = gridSize(grid);
	return nx * ny;
}

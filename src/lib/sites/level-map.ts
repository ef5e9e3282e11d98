/**
 * The level map's numbers: the model's `levelGrid` over the plan's extent, then contour lines every
 * 5 dB plus one line at each receiver limit in the map's weighting, in plan metres. Pure; the
 * component throttles calls to one per animation frame.
 */
import { levelGrid, type PackageSpec, type QuoteRequest, type Site, type Weighting } from '../acoustics';
import { contourLines, contourThresholds, gridVertexToWorld, withExtraLevels, type Vertex } from './contour-lines';
import type { PlanExtent } from './extent';
import { gridSpec } from './map-grid';

export type MapWeighting = Extract<Weighting, 'A' | 'C'>;

export interface LevelMapInput {
	packageSpec: PackageSpec;
	/** The request the desk is quoting; its site is replaced by `site`. */
	request: Omit<QuoteRequest, 'site'>;
	site: Site;
	extent: PlanExtent;
	weighting: MapWeighting;
	pointsPerSide?: number;
}

export interface MapLine {
	value: number;
	/** True for a line drawn at a receiver's limit rather than on the 5 dB ladder. */
	isLimit: boolean;
	/** Polylines in plan metres (x east, y north). */
	lines: Vertex[][];
}

export interface LevelMap {
	nx: number;
	ny: number;
	lines: MapLine[];
	/** Loudest and quietest level on the map, null when nothing is heard anywhere. */
	range: [number, number] | null;
	/** The weighting the lines are drawn in (the toggle may already show the next one while it is computed). */
	weighting: MapWeighting;
}

/** Limits the map can show as a line: receivers whose limit is in the map's weighting (not band limits). */
export function limitLevels(site: Site, weighting: MapWeighting): number[] {
	return site.receivers
		.filter((r) => r.weighting === weighting && r.bandHz === undefined && Number.isFinite(r.limitDb))
		.map((r) => r.limitDb);
}

export function computeLevelMap(input: LevelMapInput): LevelMap {
	const grid = gridSpec(input.extent, input.weighting, { pointsPerSide: input.pointsPerSide });
	// Receivers do not change the grid; leaving them out keeps the model's work to the map itself.
	const site: Site = { ...input.site, receivers: [] };
	const { nx, ny, levels } = levelGrid(input.packageSpec, { ...input.request, site }, grid);
	const ladder = contourThresholds(levels);
	const limits = limitLevels(input.site, input.weighting);
	const limitSet = new Set(limits);
	const lines = contourLines(levels, nx, ny, withExtraLevels(ladder, limits)).map((c) => ({
		value: c.value,
		isLimit: limitSet.has(c.value),
		lines: c.lines.map((line) => line.map((v) => gridVertexToWorld(grid, v)))
	}));
	let lo = Infinity;
	let hi = -Infinity;
	for (const v of levels) {
		if (v < lo) lo = v;
		if (v > hi) hi = v;
	}
	return { nx, ny, lines, range: lo <= hi ? [lo, hi] : null, weighting: input.weighting };
}

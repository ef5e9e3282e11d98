/**
 * Contour lines of a level grid, drawn with d3-contour: one threshold every 5 dB, each ring split
 * where it runs along the grid's edge (d3-contour closes rings there; a level line does not follow the
 * map's border). NaN cells (no band has a level) count as below every threshold, so they are left out.
 */
import { contours } from 'd3-contour';
import type { Grid } from '../acoustics';

export const CONTOUR_STEP_DB = 5;
/** Enough for 120 dB of range; the quietest lines are kept when there are more (limits are quiet). */
export const MAX_CONTOURS = 24;

export type Vertex = [number, number];

export interface ContourLine {
	/** Level of the line, dB. */
	value: number;
	/** Open or closed polylines, in the grid's index space (see gridVertexToWorld). */
	lines: Vertex[][];
}

/** Finite smallest and largest value, or null when the grid holds none. */
export function finiteRange(values: ArrayLike<number>): [number, number] | null {
	let lo = Infinity;
	let hi = -Infinity;
	for (let i = 0; i < values.length; i++) {
		const v = values[i];
		if (v < lo) lo = v; // NaN compares false both ways, so it is skipped
		if (v > hi) hi = v;
	}
	return lo <= hi && Number.isFinite(lo) && Number.isFinite(hi) ? [lo, hi] : null;
}

/** Multiples of the step inside the grid's range, quietest first, at most `maxCount`. */
export function contourThresholds(
	values: ArrayLike<number>,
	stepDb = CONTOUR_STEP_DB,
	maxCount = MAX_CONTOURS
): number[] {
	const range = finiteRange(values);
	if (!range || !(stepDb > 0)) return [];
	const first = Math.ceil(range[0] / stepDb);
	const last = Math.floor(range[1] / stepDb);
	const out: number[] = [];
	for (let k = first; k <= last && out.length < maxCount; k++) out.push(k * stepDb);
	return out;
}

/** Thresholds plus extra levels (e.g. receivers' limits), sorted and without repeats. */
export function withExtraLevels(thresholds: readonly number[], extra: readonly number[]): number[] {
	return [...new Set([...thresholds, ...extra.filter(Number.isFinite)])].sort((a, b) => a - b);
}

function onBorder(v: Vertex, nx: number, ny: number): boolean {
	return v[0] <= 0 || v[0] >= nx || v[1] <= 0 || v[1] >= ny;
}

/** A segment with both ends on the border follows it (or cuts a corner cell): not a level line. */
function alongBorder(a: Vertex, b: Vertex, nx: number, ny: number): boolean {
	return onBorder(a, nx, ny) && onBorder(b, nx, ny);
}

/** Splits a closed ring into the polylines that are not on the grid's border. */
export function splitAtBorder(ring: readonly Vertex[], nx: number, ny: number): Vertex[][] {
	const lines: Vertex[][] = [];
	let current: Vertex[] = [];
	for (let i = 1; i < ring.length; i++) {
		const a = ring[i - 1];
		const b = ring[i];
		if (alongBorder(a, b, nx, ny)) {
			if (current.length > 1) lines.push(current);
			current = [];
			continue;
		}
		if (current.length === 0) current.push(a);
		current.push(b);
	}
	if (current.length > 1) lines.push(current);
	// A ring that never touches the border was cut at its start: join the two ends back up.
	if (lines.length > 1) {
		const first = lines[0];
		const last = lines[lines.length - 1];
		const end = last[last.length - 1];
		if (end[0] === first[0][0] && end[1] === first[0][1]) {
			lines[0] = [...last, ...first.slice(1)];
			lines.pop();
		}
	}
	return lines;
}

/** The level lines of a grid of nx × ny values (row by row), one entry per threshold. */
export function contourLines(
	values: ArrayLike<number>,
	nx: number,
	ny: number,
	thresholds: readonly number[]
): ContourLine[] {
	if (nx < 2 || ny < 2 || thresholds.length === 0) return [];
	const generator = contours().size([nx, ny]).thresholds(thresholds as number[]);
	return generator(values as number[]).map((multi) => ({
		value: multi.value,
		lines: multi.coordinates.flatMap((polygon) =>
			polygon.flatMap((ring) => splitAtBorder(ring as Vertex[], nx, ny))
		)
	}));
}

/**
 * d3-contour puts grid value (i, j) at the centre of cell [i, i + 1] × [j, j + 1]; the model's value
 * (i, j) is at (xMin + i·step, yMin + j·step). So index-space u maps to xMin + (u − 0.5)·step.
 */
export function gridVertexToWorld(grid: Grid, vertex: Vertex): Vertex {
	return [grid.xMinM + (vertex[0] - 0.5) * grid.stepM, grid.yMinM + (vertex[1] - 0.5) * grid.stepM];
}

import { describe, expect, it } from 'vitest';
import {
	contourLines,
	contourThresholds,
	finiteRange,
	gridVertexToWorld,
	splitAtBorder,
	withExtraLevels,
	type Vertex
} from './contour-lines';

/** A synthetic level field: a point source at the grid's centre, 100 dB at 1 cell, −20·lg r (inverse square law). */
function pointSourceField(n: number): Float64Array {
	const values = new Float64Array(n * n);
	const c = (n - 1) / 2;
	for (let j = 0; j < n; j++)
		for (let i = 0; i < n; i++) values[j * n + i] = 100 - 20 * Math.log10(Math.max(1, Math.hypot(i - c, j - c)));
	return values;
}

describe('contour thresholds', () => {
	it('are the multiples of 5 dB inside the finite range, skipping NaN', () => {
		expect(contourThresholds([61.2, NaN, 74.9, 66])).toEqual([65, 70]);
		expect(contourThresholds([60, 75])).toEqual([60, 65, 70, 75]);
		expect(finiteRange([NaN, NaN])).toBeNull();
		expect(contourThresholds([NaN])).toEqual([]);
	});

	it('keep the quietest when there are too many', () => {
		expect(contourThresholds([0, 200], 5, 3)).toEqual([0, 5, 10]);
	});

	it('add limit levels once, in order', () => {
		expect(withExtraLevels([60, 65], [63, 65, NaN])).toEqual([60, 63, 65]);
	});
});

describe('contour lines', () => {
	it('draws circles round a point source at the inverse-square radius', () => {
		const n = 101;
		const lines = contourLines(pointSourceField(n), n, n, [70, 80]);
		expect(lines.map((l) => l.value)).toEqual([70, 80]);
		// 100 − 20·lg r = 80 → r = 10 cells; 70 → r = 31.6 cells. Centre sits at index 50 → 50.5 in d3 space.
		for (const [line, radius] of [
			[lines[0], Math.pow(10, 30 / 20)],
			[lines[1], 10]
		] as const) {
			expect(line.lines).toHaveLength(1);
			for (const [x, y] of line.lines[0]) expect(Math.hypot(x - 50.5, y - 50.5)).toBeCloseTo(radius, 0);
		}
	});

	it('leaves NaN cells out and never follows the grid border', () => {
		const n = 20;
		const values = new Float64Array(n * n).fill(50);
		for (let j = 0; j < n; j++) for (let i = 0; i < n / 2; i++) values[j * n + i] = NaN;
		const [line] = contourLines(values, n, n, [45]);
		// One straight edge between the heard and unheard halves, from the bottom border to the top,
		// through the centres of the first heard cells (index 10 → 10.5 in d3-contour's space).
		expect(line.lines).toHaveLength(1);
		for (const [x] of line.lines[0]) expect(x).toBeCloseTo(10.5, 6);
	});

	it('splits a ring where it runs along the border and rejoins one that does not', () => {
		const square: Vertex[] = [
			[0, 2],
			[0, 0],
			[3, 0],
			[3, 2],
			[0, 2]
		];
		expect(splitAtBorder(square, 10, 10)).toEqual([
			[
				[3, 0],
				[3, 2],
				[0, 2]
			]
		]);
		const inner: Vertex[] = [
			[2, 2],
			[4, 2],
			[4, 4],
			[2, 2]
		];
		expect(splitAtBorder(inner, 10, 10)).toEqual([inner]);
	});

	it('maps index space to plan metres', () => {
		const grid = { xMinM: -50, yMinM: 10, xMaxM: 50, yMaxM: 110, stepM: 2, weighting: 'A' as const };
		expect(gridVertexToWorld(grid, [0.5, 0.5])).toEqual([-50, 10]);
		expect(gridVertexToWorld(grid, [10.5, 5.5])).toEqual([-30, 20]);
	});
});

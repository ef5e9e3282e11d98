import { describe, expect, it } from 'vitest';
import { MAX_GRID_POINTS } from '../acoustics';
import { gridPointCount, gridSize, gridSpec } from './map-grid';

describe('grid for the level map', () => {
	it('puts 100 points on the longer side and covers the extent', () => {
		const extent = { xMinM: -200, xMaxM: 300, yMinM: -100, yMaxM: 200 };
		const grid = gridSpec(extent, 'A');
		const { nx, ny } = gridSize(grid);
		expect(nx).toBe(100);
		expect(ny).toBe(61);
		expect(grid.xMinM + (nx - 1) * grid.stepM).toBeCloseTo(300, 6);
		expect(grid.yMinM + (ny - 1) * grid.stepM).toBeGreaterThanOrEqual(199.99);
		expect(grid.weighting).toBe('A');
	});

	it('gives a square extent 100 × 100', () => {
		const grid = gridSpec({ xMinM: 0, xMaxM: 77.7, yMinM: -3.3, yMaxM: 74.4 }, 'C');
		expect(gridSize(grid)).toEqual({ nx: 100, ny: 100 });
	});

	it('never asks for more than the model allows', () => {
		const grid = gridSpec({ xMinM: 0, xMaxM: 1000, yMinM: 0, yMaxM: 1000 }, 'A', { pointsPerSide: 5000 });
		expect(gridPointCount(grid)).toBeLessThanOrEqual(MAX_GRID_POINTS);
	});

	it('passes the receiver height on and refuses an empty extent', () => {
		expect(gridSpec({ xMinM: 0, xMaxM: 10, yMinM: 0, yMaxM: 10 }, 'A', { heightM: 4 }).heightM).toBe(4);
		expect(() => gridSpec({ xMinM: 0, xMaxM: 0, yMinM: 0, yMaxM: 10 }, 'A')).toThrow(RangeError);
	});
});

import { describe, expect, it } from 'vitest';
import {
	bearingOf,
	distanceAlongAim,
	distanceOf,
	normaliseBearing,
	offAxisOf,
	pointOnBearing,
	roundTo
} from './geometry';

// Conventions from shared/acoustics.md step 3b: x east, y north, bearing = atan2(x, y) clockwise from north.
describe('bearings and distances from the system', () => {
	it('reads the four compass points', () => {
		expect(bearingOf({ x: 0, y: 10 })).toBe(0);
		expect(bearingOf({ x: 10, y: 0 })).toBeCloseTo(90, 12);
		expect(bearingOf({ x: 0, y: -10 })).toBeCloseTo(180, 12);
		expect(bearingOf({ x: -10, y: 0 })).toBeCloseTo(270, 12);
	});

	it('measures a 3-4-5 triangle', () => {
		expect(distanceOf({ x: 30, y: 40 })).toBe(50);
		// tan(b) = 3/4 → 36.87° (plane trigonometry)
		expect(bearingOf({ x: 30, y: 40 })).toBeCloseTo(36.8699, 4);
	});

	it('takes the origin as north', () => {
		expect(bearingOf({ x: 0, y: 0 })).toBe(0);
	});

	it('places a point on a bearing and reads it back', () => {
		for (const bearing of [0, 10, 90, 135, 200, 359]) {
			const p = pointOnBearing(bearing, 120);
			expect(distanceOf(p)).toBeCloseTo(120, 9);
			expect(bearingOf(p)).toBeCloseTo(bearing, 9);
		}
		const east = pointOnBearing(90, 50);
		expect(east.x).toBeCloseTo(50, 12);
		expect(east.y).toBeCloseTo(0, 12);
	});

	it('folds angles into 0 … 360', () => {
		expect(normaliseBearing(-90)).toBe(270);
		expect(normaliseBearing(720)).toBe(0);
		expect(normaliseBearing(-1e-13)).toBeLessThan(360);
	});

	it('gives the off-axis angle as the model does (0 … 180, symmetric)', () => {
		expect(offAxisOf(90, 90)).toBe(0);
		expect(offAxisOf(270, 90)).toBe(180);
		expect(offAxisOf(10, 350)).toBe(20);
		expect(offAxisOf(330, 30)).toBe(60);
	});

	it('projects a point on the aim, never behind the system', () => {
		expect(distanceAlongAim({ x: 10, y: 40 }, 0)).toBe(40);
		expect(distanceAlongAim({ x: 0, y: -40 }, 0)).toBe(0);
	});

	it('rounds without floating-point tails or negative zero', () => {
		expect(roundTo(12.34, 0.1)).toBe(12.3);
		expect(Object.is(roundTo(-0.01, 0.1), 0)).toBe(true);
		expect(roundTo(0.1 + 0.2, 0.1)).toBe(0.3);
	});
});

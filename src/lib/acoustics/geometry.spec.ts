// Contract step 3b geometry: x east, y north, bearings clockwise from north.
import { describe, expect, it } from 'vitest';
import { bearingDeg, offAxisDeg, pointOnBearing } from './geometry';

describe('bearings and off-axis angles (contract step 3b)', () => {
	it('bearing = atan2(x, y): north 0°, east 90°, south 180°, west −90°', () => {
		expect(bearingDeg(0, 10)).toBe(0);
		expect(bearingDeg(10, 0)).toBeCloseTo(90, 12);
		expect(bearingDeg(0, -10)).toBeCloseTo(180, 12);
		expect(bearingDeg(-10, 0)).toBeCloseTo(-90, 12);
		expect(bearingDeg(10, 10)).toBeCloseTo(45, 12);
	});

	it('φ = |((bearing − aim + 540) mod 360) − 180|: 0 on the aim, 180 behind, symmetric left and right', () => {
		expect(offAxisDeg(0, 50, 0)).toBe(0);
		expect(offAxisDeg(0, -50, 0)).toBeCloseTo(180, 12);
		expect(offAxisDeg(50, 0, 0)).toBeCloseTo(90, 12);
		expect(offAxisDeg(-50, 0, 0)).toBeCloseTo(90, 12);
		expect(offAxisDeg(50, 50, 90)).toBeCloseTo(45, 12);
		expect(offAxisDeg(50, -50, 90)).toBeCloseTo(45, 12);
	});

	it('wraps around north: aim 350°, a point at bearing 10° is 20° off axis; aim 10°, bearing −10° likewise', () => {
		const at10 = pointOnBearing(100, 10);
		expect(offAxisDeg(at10.x, at10.y, 350)).toBeCloseTo(20, 10);
		const atMinus10 = pointOnBearing(100, -10);
		expect(offAxisDeg(atMinus10.x, atMinus10.y, 10)).toBeCloseTo(20, 10);
		// Aims outside 0 … 360 are the same directions.
		expect(offAxisDeg(at10.x, at10.y, -10)).toBeCloseTo(20, 10);
		expect(offAxisDeg(at10.x, at10.y, 730)).toBeCloseTo(0, 10);
	});

	it('φ = 0 at the origin, where there is no bearing', () => {
		expect(offAxisDeg(0, 0, 123)).toBe(0);
	});

	it('pointOnBearing puts the position at horizontal distance d on the aim bearing', () => {
		const p = pointOnBearing(30, 90);
		expect(p.x).toBeCloseTo(30, 12);
		expect(p.y).toBeCloseTo(0, 12);
		expect(Math.hypot(pointOnBearing(30, 233).x, pointOnBearing(30, 233).y)).toBeCloseTo(30, 12);
	});
});

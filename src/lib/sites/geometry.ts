/**
 * Plan geometry of a site: metres, x east, y north, the system at the origin, bearings in degrees
 * clockwise from north (+y), as in the acoustic model's `Site` (shared/acoustics.md step 3b).
 */

export interface PlanPoint {
	x: number;
	y: number;
}

/** An angle folded into 0 ≤ deg < 360. */
export function normaliseBearing(deg: number): number {
	const folded = deg % 360;
	const positive = folded < 0 ? folded + 360 : folded;
	// −0.0000001 % 360 + 360 rounds to 360 in floating point; that bearing is north.
	return positive >= 360 ? 0 : positive;
}

/** Horizontal distance of a point from the system. */
export function distanceOf(point: PlanPoint): number {
	return Math.hypot(point.x, point.y);
}

/** Bearing of a point seen from the system, 0 ≤ b < 360; the origin itself is taken as north (0). */
export function bearingOf(point: PlanPoint): number {
	if (point.x === 0 && point.y === 0) return 0;
	return normaliseBearing((Math.atan2(point.x, point.y) * 180) / Math.PI);
}

/** The point at a horizontal distance on a bearing, e.g. the position at distanceM on the aim. */
export function pointOnBearing(bearingDeg: number, distanceM: number): PlanPoint {
	const rad = (bearingDeg * Math.PI) / 180;
	return { x: distanceM * Math.sin(rad), y: distanceM * Math.cos(rad) };
}

/** Off-axis angle 0…180° of a bearing from the aim, as the model computes it (step 3b). */
export function offAxisOf(bearingDeg: number, aimDeg: number): number {
	return Math.abs(((((bearingDeg - aimDeg + 540) % 360) + 360) % 360) - 180);
}

/** How far along the aim a point lies (its projection on the aim's axis), never below 0. */
export function distanceAlongAim(point: PlanPoint, aimDeg: number): number {
	const axis = pointOnBearing(aimDeg, 1);
	return Math.max(0, point.x * axis.x + point.y * axis.y);
}

/** Rounds to a step (e.g. 0.1 m) so typed and dragged values stay readable. */
export function roundTo(value: number, step: number): number {
	const rounded = Math.round(value / step) * step;
	// Clears the −0 and the 12.300000000000001 that plain multiplication leaves behind.
	return Number((rounded + 0).toFixed(Math.max(0, Math.ceil(-Math.log10(step)))));
}

/**
 * Site geometry (contract step 3b). Metres, x east, y north; bearings in degrees clockwise from
 * north (+y), so east is 90°. Every group stands at the origin.
 */

const DEG = 180 / Math.PI;

/** Bearing of (x, y) from the origin, atan2(x, y) in degrees, −180 … 180. */
export function bearingDeg(x: number, y: number): number {
	return Math.atan2(x, y) * DEG;
}

/**
 * Off-axis angle φ (0 … 180°) of (x, y) from a system aimed at `aimDeg`:
 * |((bearing − aimDeg + 540) mod 360) − 180|, with mod always non-negative; φ = 0 at the origin.
 */
export function offAxisDeg(x: number, y: number, aimDeg: number): number {
	if (x === 0 && y === 0) return 0;
	const turned = (((bearingDeg(x, y) - aimDeg + 540) % 360) + 360) % 360;
	return Math.abs(turned - 180);
}

/** The point at horizontal distance d on bearing `bearing` from the origin. */
export function pointOnBearing(distanceM: number, bearing: number): { x: number; y: number } {
	const radians = bearing / DEG;
	return { x: distanceM * Math.sin(radians), y: distanceM * Math.cos(radians) };
}

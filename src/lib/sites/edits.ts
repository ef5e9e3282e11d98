/**
 * Changes the desk makes to a site on the plan, as pure functions returning a new `Site` (the plan
 * never mutates what its parent owns). Lengths are snapped to 0.1 of the unit shown, so a dragged
 * receiver reads 120.4 m or 395.1 ft, not 120.41837 m.
 */
import type { Receiver, Site } from '../acoustics';
import { bearingOf, distanceOf, normaliseBearing, pointOnBearing, roundTo, type PlanPoint } from './geometry';
import type { DistanceUnit } from '../acoustics/units';
import { fromDisplayLength, toDisplayLength } from './units';

/** The position is never closer than this to the system (the model takes anything nearer as 1 m). */
export const MIN_POSITION_M = 1;

export function snapLength(metres: number, units: DistanceUnit): number {
	return fromDisplayLength(roundTo(toDisplayLength(metres, units), 0.1), units);
}

export function snapPoint(point: PlanPoint, units: DistanceUnit): PlanPoint {
	return { x: snapLength(point.x, units), y: snapLength(point.y, units) };
}

/** Arrow keys as a move in display units: 1 unit, 10 with shift; null for any other key. */
export function arrowStep(event: { key: string; shiftKey: boolean }): { dx: number; dy: number } | null {
	const step = event.shiftKey ? 10 : 1;
	switch (event.key) {
		case 'ArrowUp':
			return { dx: 0, dy: step };
		case 'ArrowDown':
			return { dx: 0, dy: -step };
		case 'ArrowRight':
			return { dx: step, dy: 0 };
		case 'ArrowLeft':
			return { dx: -step, dy: 0 };
		default:
			return null;
	}
}

export function updateReceiver(site: Site, index: number, patch: Partial<Receiver>): Site {
	return { ...site, receivers: site.receivers.map((r, i) => (i === index ? { ...r, ...patch } : r)) };
}

export function moveReceiver(site: Site, index: number, point: PlanPoint, units: DistanceUnit): Site {
	return updateReceiver(site, index, snapPoint(point, units));
}

/** Moves a receiver by a step in display units (keyboard). */
export function nudgeReceiver(site: Site, index: number, dx: number, dy: number, units: DistanceUnit): Site {
	const r = site.receivers[index];
	if (!r) return site;
	const point = { x: r.x + fromDisplayLength(dx, units), y: r.y + fromDisplayLength(dy, units) };
	return moveReceiver(site, index, point, units);
}

/** The same point at a new distance or bearing from the system, the other kept. */
export function withPolar(point: PlanPoint, change: { distanceM?: number; bearingDeg?: number }): PlanPoint {
	const distance = change.distanceM ?? distanceOf(point);
	const bearing = change.bearingDeg ?? bearingOf(point);
	return pointOnBearing(bearing, Math.max(0, distance));
}

export function removeReceiver(site: Site, index: number): Site {
	return { ...site, receivers: site.receivers.filter((_, i) => i !== index) };
}

/** "Receiver 3", or the next free number when that name is taken. */
export function nextReceiverName(site: Site): string {
	const names = new Set(site.receivers.map((r) => r.name));
	let n = site.receivers.length + 1;
	while (names.has(`Receiver ${n}`)) n++;
	return `Receiver ${n}`;
}

/** A new receiver on the aim, twice as far as the position, with the limit and weighting given. */
export function addReceiver(
	site: Site,
	positionM: number,
	limit: { limitDb: number; weighting: Receiver['weighting'] },
	units: DistanceUnit
): Site {
	const point = snapPoint(pointOnBearing(site.aimDeg, Math.max(2 * positionM, 20)), units);
	return { ...site, receivers: [...site.receivers, { name: nextReceiverName(site), ...point, ...limit }] };
}

/** Aim and position distance from a point the desk dragged the position to. */
export function aimAndDistanceFrom(point: PlanPoint, units: DistanceUnit): { aimDeg: number; distanceM: number } {
	return {
		aimDeg: normaliseBearing(Math.round(bearingOf(point))),
		distanceM: Math.max(MIN_POSITION_M, snapLength(distanceOf(point), units))
	};
}

/** Keyboard on the position: left/right turn the aim 1° (10° with shift), up/down change the distance. */
export function nudgePosition(
	aimDeg: number,
	distanceM: number,
	event: { key: string; shiftKey: boolean },
	units: DistanceUnit
): { aimDeg: number; distanceM: number } | null {
	const step = arrowStep(event);
	if (!step) return null;
	return {
		aimDeg: normaliseBearing(aimDeg + step.dx),
		distanceM: Math.max(MIN_POSITION_M, snapLength(distanceM + fromDisplayLength(step.dy, units), units))
	};
}

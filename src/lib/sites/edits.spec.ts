import { describe, expect, it } from 'vitest';
import type { Site } from '../acoustics';
import {
	addReceiver,
	aimAndDistanceFrom,
	arrowStep,
	moveReceiver,
	nextReceiverName,
	nudgePosition,
	nudgeReceiver,
	removeReceiver,
	snapLength,
	updateReceiver,
	withPolar
} from './edits';
import { bearingOf, distanceOf } from './geometry';

const site = (): Site => ({
	aimDeg: 90,
	groundFactor: 0.5,
	receivers: [
		{ name: 'North gate', x: 0, y: 100, limitDb: 60, weighting: 'A' },
		{ name: 'Yard', x: -50, y: 0, limitDb: 75, weighting: 'C' }
	]
});

describe('site edits', () => {
	it('never change the site they are given', () => {
		const before = site();
		const frozen = JSON.stringify(before);
		moveReceiver(before, 0, { x: 3, y: 4 }, 'm');
		updateReceiver(before, 1, { limitDb: 70 });
		removeReceiver(before, 0);
		addReceiver(before, 40, { limitDb: 65, weighting: 'A' }, 'm');
		expect(JSON.stringify(before)).toBe(frozen);
	});

	it('snap to a tenth of the unit shown', () => {
		expect(snapLength(12.345, 'm')).toBe(12.3);
		// 0.1 ft steps: 100.04 ft → 100.0 ft = 30.48 m
		expect(snapLength(30.4922, 'ft')).toBeCloseTo(30.48, 9);
	});

	it('move with arrow keys by 1 unit, 10 with shift', () => {
		expect(arrowStep({ key: 'ArrowUp', shiftKey: false })).toEqual({ dx: 0, dy: 1 });
		expect(arrowStep({ key: 'ArrowLeft', shiftKey: true })).toEqual({ dx: -10, dy: 0 });
		expect(arrowStep({ key: 'Enter', shiftKey: false })).toBeNull();
		const moved = nudgeReceiver(site(), 0, 10, -1, 'm');
		expect(moved.receivers[0]).toMatchObject({ x: 10, y: 99 });
		const inFeet = nudgeReceiver(site(), 1, 1, 0, 'ft');
		expect(inFeet.receivers[1].x).toBeCloseTo(-50 + 0.3048, 1);
	});

	it('change distance or bearing and keep the other', () => {
		const p = withPolar({ x: 0, y: 100 }, { bearingDeg: 90 });
		expect(p.x).toBeCloseTo(100, 9);
		expect(p.y).toBeCloseTo(0, 9);
		const q = withPolar({ x: 30, y: 40 }, { distanceM: 100 });
		expect(distanceOf(q)).toBeCloseTo(100, 9);
		expect(bearingOf(q)).toBeCloseTo(bearingOf({ x: 30, y: 40 }), 9);
	});

	it('name and place a new receiver on the aim', () => {
		const added = addReceiver(site(), 40, { limitDb: 65, weighting: 'A' }, 'm');
		expect(added.receivers[2]).toMatchObject({ name: 'Receiver 3', x: 80, y: 0, limitDb: 65 });
		expect(nextReceiverName(added)).toBe('Receiver 4');
	});

	it('turn the position drag into an aim and a distance', () => {
		expect(aimAndDistanceFrom({ x: -30, y: -40 }, 'm')).toEqual({ aimDeg: 217, distanceM: 50 });
		expect(aimAndDistanceFrom({ x: 0, y: 0.2 }, 'm').distanceM).toBe(1);
		expect(nudgePosition(359, 40, { key: 'ArrowRight', shiftKey: false }, 'm')).toEqual({ aimDeg: 0, distanceM: 40 });
		expect(nudgePosition(10, 40, { key: 'ArrowDown', shiftKey: true }, 'm')).toEqual({ aimDeg: 10, distanceM: 30 });
	});
});

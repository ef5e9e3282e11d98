import { describe, expect, it } from 'vitest';
import { siteSchema } from '../schemas/sites';
import { distanceAndBearing, groundFactorOf, limitLabel, toModelSite } from './model-site';

describe('groundFactorOf', () => {
	// ISO 9613-2:1996 §7.3.1: hard ground G = 0, porous ground G = 1, mixed ground the porous fraction.
	it('maps the named grounds to ISO 9613-2 G values', () => {
		expect(groundFactorOf('hard', null)).toBe(0);
		expect(groundFactorOf('mixed', null)).toBe(0.5);
		expect(groundFactorOf('porous', 0.2)).toBe(1);
		expect(groundFactorOf('custom', 0.3)).toBe(0.3);
		expect(groundFactorOf('none', 0.3)).toBeNull();
	});
});

describe('toModelSite', () => {
	it('carries the site into the model’s shape, a band limit unweighted', () => {
		const site = siteSchema.parse({
			name: 'Quay',
			ground: 'hard',
			aimDeg: 360,
			allowanceDb: 2,
			receivers: [
				{ name: 'Flats', x: 3, y: 4, limitDb: 60, weighting: 'A' },
				{ name: 'Office', x: -3, y: 4, limitDb: 70, weighting: 'A', bandHz: 63, heightM: 6 }
			]
		});
		expect(toModelSite(site)).toEqual({
			aimDeg: 0,
			groundFactor: 0,
			positionHeightM: 1.5,
			allowanceDb: 2,
			receivers: [
				{ name: 'Flats', x: 3, y: 4, heightM: 1.5, limitDb: 60, weighting: 'A' },
				{ name: 'Office', x: -3, y: 4, heightM: 6, limitDb: 70, weighting: 'Z', bandHz: 63 }
			]
		});
	});
});

describe('distanceAndBearing', () => {
	it('gives compass bearings clockwise from north', () => {
		expect(distanceAndBearing(0, 10)).toEqual({ distanceM: 10, bearingDeg: 0 });
		expect(distanceAndBearing(10, 0).bearingDeg).toBeCloseTo(90);
		expect(distanceAndBearing(0, -10).bearingDeg).toBeCloseTo(180);
		expect(distanceAndBearing(-10, 0).bearingDeg).toBeCloseTo(270);
		expect(distanceAndBearing(3, 4).distanceM).toBe(5);
	});
});

describe('limitLabel', () => {
	it('reads as the licence would', () => {
		expect(limitLabel({ limitDb: 55, weighting: 'A', bandHz: null })).toBe('55 dB(A)');
		expect(limitLabel({ limitDb: 70, weighting: 'Z', bandHz: 63 })).toBe('70 dB at 63 Hz');
	});
});

describe('limits on screen carry their unit', () => {
	it('a boundary limit reads "limit 65 dB(C)", a band limit "limit 70 dB at 63 Hz"', () => {
		expect(`limit ${limitLabel({ limitDb: 65, weighting: 'C' })}`).toBe('limit 65 dB(C)');
		expect(`limit ${limitLabel({ limitDb: 70, weighting: 'Z', bandHz: 63 })}`).toBe('limit 70 dB at 63 Hz');
	});
});

import { describe, expect, it } from 'vitest';
import { levelGrid, type PackageSpec, type QuoteRequest, type Site } from '../acoustics';
import { computeLevelMap, limitLevels } from './level-map';

// Invented test inputs (not demo data): one full-range stack and one sub stack.
const amplifier = { channels: 2, powerW: { 8: 1000, 4: 1600 }, minLoadOhm: 4 };
const pkg: PackageSpec = {
	groups: [
		{
			loudspeaker: { kind: 'full-range', sensitivityDb: 98, sensitivityRef: '1W', impedanceOhm: 8, powerContinuousW: 600, dispersionHDeg: 80, dispersionVDeg: 40, lowHz: 60, highHz: 16000 },
			count: 2, amplifier, cabinetsPerChannel: 1, heightM: 2.5
		},
		{
			loudspeaker: { kind: 'subwoofer', sensitivityDb: 97, sensitivityRef: '1W', impedanceOhm: 8, powerContinuousW: 800, dispersionHDeg: 360, dispersionVDeg: 360, lowHz: 31.5, highHz: 125 },
			count: 2, amplifier, cabinetsPerChannel: 1, heightM: 0.5
		}
	]
};
const request: Omit<QuoteRequest, 'site'> = {
	targetDb: 92, weighting: 'A', distanceM: 25,
	programme: { bandsDb: { 63: 0, 125: 0, 250: -3, 500: -5, 1000: -7, 2000: -9, 4000: -12 }, crestFactorDb: 12 },
	air: { temperatureC: 15, humidityPct: 70 }
};
const site: Site = {
	aimDeg: 45,
	groundFactor: 0.5,
	receivers: [
		{ name: 'East', x: 200, y: 0, limitDb: 62, weighting: 'A' },
		{ name: 'Band', x: 0, y: -150, limitDb: 70, weighting: 'Z', bandHz: 63 },
		{ name: 'North', x: 0, y: 250, limitDb: 72, weighting: 'C' }
	]
};
const extent = { xMinM: -300, xMaxM: 300, yMinM: -300, yMaxM: 300 };

/** The model's own level at one plan point (a 1 × 1 grid). */
function levelAt(x: number, y: number, weighting: 'A' | 'C'): number {
	const grid = { xMinM: x, yMinM: y, xMaxM: x, yMaxM: y, stepM: 1, weighting };
	return levelGrid(pkg, { ...request, site: { ...site, receivers: [] } }, grid).levels[0];
}

describe('level map', () => {
	const map = computeLevelMap({ packageSpec: pkg, request, site, extent, weighting: 'A' });

	it('draws a line every 5 dB across the map, and one at each dB(A) limit', () => {
		expect(map.nx).toBe(100);
		const ladder = map.lines.filter((l) => !l.isLimit).map((l) => l.value);
		expect(ladder.length).toBeGreaterThan(3);
		for (const v of ladder) expect(v % 5).toBe(0);
		expect(map.lines.filter((l) => l.isLimit).map((l) => l.value)).toEqual([62]);
		expect(limitLevels(site, 'C')).toEqual([72]); // band limits never become map lines
	});

	it('puts each line where the model predicts its level (within 1 dB: linear interpolation between grid points)', () => {
		for (const line of map.lines) {
			const polyline = line.lines[0];
			for (const [x, y] of [polyline[0], polyline[Math.floor(polyline.length / 2)]]) {
				if (Math.hypot(x, y) < 20) continue; // near the system the level changes fastest; spacing 6 m is coarse there
				expect(Math.abs(levelAt(x, y, 'A') - line.value)).toBeLessThan(1);
			}
		}
	});

	it('keeps every vertex on the plan', () => {
		const step = 600 / 99;
		for (const line of map.lines)
			for (const poly of line.lines)
				for (const [x, y] of poly) {
					expect(x).toBeGreaterThanOrEqual(extent.xMinM - step);
					expect(y).toBeLessThanOrEqual(extent.yMaxM + step);
				}
	});

	it('does not change when only receivers move (they are not part of the grid)', () => {
		const moved = { ...site, receivers: site.receivers.map((r) => ({ ...r, x: r.x + 37, y: r.y - 11 })) };
		expect(computeLevelMap({ packageSpec: pkg, request, site: moved, extent, weighting: 'A' })).toEqual(map);
	});

	it('changes with the aim and with the weighting', () => {
		const turned = computeLevelMap({ packageSpec: pkg, request, site: { ...site, aimDeg: 225 }, extent, weighting: 'A' });
		expect(turned.lines).not.toEqual(map.lines);
		const inC = computeLevelMap({ packageSpec: pkg, request, site, extent, weighting: 'C' });
		expect(inC.range![1]).toBeGreaterThan(map.range![1]);
	});
});

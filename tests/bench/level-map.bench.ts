/**
 * Benchmark of the level map as the site plan computes it in the browser: the model's levelGrid on
 * a 100 × 100 grid, then d3-contour lines every 5 dB with limit lines (computeLevelMap), and the
 * contour step alone on the same grid; each against the acoustics bench's baseline (sumLevels over
 * nine values) measured in the same run. Plain tsx script:
 *   npx tsx tests/bench/level-map.bench.ts
 * Target: ≥ 10 maps per second (the plan redraws at most once per animation frame while dragging).
 * The package, request and site are invented bench inputs.
 */
import { pathToFileURL } from 'node:url';
import { levelGrid, sumLevels, type PackageSpec, type QuoteRequest, type Site } from '../../src/lib/acoustics/index';
import { contourLines, contourThresholds } from '../../src/lib/sites/contour-lines';
import { planExtent } from '../../src/lib/sites/extent';
import { computeLevelMap } from '../../src/lib/sites/level-map';
import { gridSpec } from '../../src/lib/sites/map-grid';

export interface LevelMapBench {
	name: string;
	opsPerSec: number;
	baselineOpsPerSec: number;
	ratio: number;
}

const amplifier = { channels: 4, powerW: { 8: 1200, 4: 2000, 2: 2800 }, minLoadOhm: 2 };
const pkg: PackageSpec = {
	groups: [
		{
			loudspeaker: { kind: 'full-range', sensitivityDb: 99, sensitivityRef: '1W', impedanceOhm: 8, powerContinuousW: 700, dispersionHDeg: 90, dispersionVDeg: 40, lowHz: 60, highHz: 18000 },
			count: 2, stacks: 2, amplifier, cabinetsPerChannel: 1, heightM: 3, spacingM: 12
		},
		{
			loudspeaker: { kind: 'subwoofer', sensitivityDb: 98, sensitivityRef: '1W', impedanceOhm: 8, powerContinuousW: 1000, dispersionHDeg: 360, dispersionVDeg: 360, lowHz: 31.5, highHz: 125 },
			count: 2, stacks: 2, amplifier, cabinetsPerChannel: 1, heightM: 0.6
		}
	]
};
const request: Omit<QuoteRequest, 'site'> = {
	targetDb: 95, weighting: 'A', distanceM: 30, audienceWidthM: 30,
	programme: { bandsDb: { 63: 0, 125: 0, 250: -3, 500: -5, 1000: -7, 2000: -9, 4000: -11, 8000: -14 }, crestFactorDb: 12 },
	air: { temperatureC: 15, humidityPct: 70 }
};
const site: Site = {
	aimDeg: 30, groundFactor: 0.6, receivers: [
		{ name: 'A', x: -150, y: 200, limitDb: 62, weighting: 'A' },
		{ name: 'B', x: 220, y: -80, limitDb: 58, weighting: 'A' },
		{ name: 'C', x: 40, y: 300, limitDb: 78, weighting: 'C' }
	]
};
const extent = planExtent(site.receivers, { aspect: 1 });
const BASELINE_VALUES = [80, 82, 85, 83, 79, 76, 74, 70, 66];

function measure(work: (n: number) => void, minMs: number): number {
	let n = 1;
	for (;;) {
		const start = performance.now();
		work(n);
		const elapsed = performance.now() - start;
		if (elapsed >= minMs) return (n * 1000) / elapsed;
		n *= elapsed > 0 ? Math.min(10, Math.max(2, Math.ceil((minMs * 1.2) / elapsed))) : 10;
	}
}

let sink = 0;

export function runLevelMapBench(minMs = 1000): LevelMapBench[] {
	const baseline = (n: number) => {
		for (let i = 0; i < n; i++) sink += sumLevels(BASELINE_VALUES);
	};
	const map = (n: number) => {
		for (let i = 0; i < n; i++) sink += computeLevelMap({ packageSpec: pkg, request, site, extent, weighting: 'A' }).lines.length;
	};
	const grid = gridSpec(extent, 'A');
	const { nx, ny, levels } = levelGrid(pkg, { ...request, site: { ...site, receivers: [] } }, grid);
	const thresholds = contourThresholds(levels);
	const contoursOnly = (n: number) => {
		for (let i = 0; i < n; i++) sink += contourLines(levels, nx, ny, thresholds).length;
	};
	baseline(200_000);
	map(3);
	contoursOnly(10);
	const baselineOpsPerSec = measure(baseline, minMs);
	return [
		{ name: `level map ${nx}×${ny} (levelGrid + contours)`, fn: map },
		{ name: `contours only ${nx}×${ny} (${thresholds.length} levels)`, fn: contoursOnly }
	].map(({ name, fn }) => {
		const opsPerSec = measure(fn, minMs);
		return { name, opsPerSec, baselineOpsPerSec, ratio: opsPerSec / baselineOpsPerSec };
	});
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
	for (const r of runLevelMapBench()) {
		console.log(r.name);
		console.log(`  per second:      ${r.opsPerSec.toFixed(1)}  (target ≥ 10 maps/s)`);
		console.log(`  baseline ops/s:  ${Math.round(r.baselineOpsPerSec).toLocaleString('en-GB')}  (sumLevels over 9 values)`);
		console.log(`  ratio:           ${r.ratio.toExponential(3)}`);
	}
	if (!Number.isFinite(sink)) console.log('(sink not finite)');
}

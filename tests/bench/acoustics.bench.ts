/**
 * Benchmark of the acoustic model: evaluatePackage on a realistic three-group package (tops,
 * subwoofers, line-array hangs) with a boundary, against a baseline measured in the same run
 * (sumLevels over nine values, the smallest unit of work the model repeats). Plain tsx script:
 *   npx tsx tests/bench/acoustics.bench.ts
 * ratio = opsPerSec / baselineOpsPerSec, a machine-independent figure to compare between runs.
 * Target: ≥ 50,000 evaluations per second on one core. The specs below are invented bench inputs.
 */
import { pathToFileURL } from 'node:url';
import {
	evaluatePackage,
	sumLevels,
	type PackageSpec,
	type QuoteRequest
} from '../../src/lib/acoustics/index';

export interface BenchResult {
	name: string;
	opsPerSec: number;
	baselineOpsPerSec: number;
	ratio: number;
}

const amplifier = { channels: 4, powerW: { 8: 1100, 4: 1800, 2: 2600 }, minLoadOhm: 2 };

const benchPackage: PackageSpec = {
	groups: [
		{
			loudspeaker: {
				kind: 'full-range',
				sensitivityDb: 99,
				sensitivityRef: '2.83V',
				impedanceOhm: 8,
				powerContinuousW: 500,
				maxSplContinuousDb: 129,
				maxSplPeakDb: 135,
				dispersionHDeg: 90,
				dispersionVDeg: 40,
				lowHz: 60,
				highHz: 18000
			},
			count: 2,
			stacks: 2,
			amplifier,
			cabinetsPerChannel: 2
		},
		{
			loudspeaker: {
				kind: 'subwoofer',
				sensitivityDb: 100,
				sensitivityRef: '1W',
				impedanceOhm: 8,
				powerContinuousW: 1000,
				powerPeakW: 4000,
				maxSplPeakDb: 139,
				dispersionHDeg: 360,
				dispersionVDeg: 360,
				lowHz: 30,
				highHz: 120
			},
			count: 3,
			stacks: 2,
			amplifier,
			cabinetsPerChannel: 1
		},
		{
			loudspeaker: {
				kind: 'line-array-element',
				sensitivityDb: 102,
				sensitivityRef: '1W',
				impedanceOhm: 16,
				powerContinuousW: 600,
				maxSplPeakDb: 139,
				dispersionHDeg: 100,
				dispersionVDeg: 10,
				lowHz: 55,
				highHz: 18000,
				heightM: 0.3
			},
			count: 8,
			stacks: 2,
			amplifier,
			cabinetsPerChannel: 2
		}
	]
};

const benchRequest: QuoteRequest = {
	targetDb: 100,
	weighting: 'A',
	distanceM: 30,
	audienceWidthM: 40,
	programme: {
		bandsDb: {
			31.5: -6,
			63: 0,
			125: -1,
			250: -4,
			500: -6,
			1000: -7,
			2000: -9,
			4000: -12,
			8000: -16
		},
		crestFactorDb: 12
	},
	air: { temperatureC: 18, humidityPct: 60 },
	boundary: { distanceM: 250, limitDb: 75, weighting: 'A' }
};

const BASELINE_VALUES = [80, 82, 85, 83, 79, 76, 74, 70, 66];

/** Runs `work` in growing batches until at least `minMs` has passed; returns operations per second. */
function measure(work: (iterations: number) => number, minMs: number): number {
	let iterations = 1000;
	for (;;) {
		const start = performance.now();
		work(iterations);
		const elapsed = performance.now() - start;
		if (elapsed >= minMs) return (iterations * 1000) / elapsed;
		iterations *= elapsed > 0 ? Math.min(10, Math.max(2, Math.ceil((minMs * 1.2) / elapsed))) : 10;
	}
}

let sink = 0; // keeps the optimiser from dropping the work

export function runAcousticsBench(minMs = 1000): BenchResult {
	const evaluate = (n: number) => {
		for (let i = 0; i < n; i++) sink += evaluatePackage(benchPackage, benchRequest).headroomDb;
		return sink;
	};
	const baseline = (n: number) => {
		for (let i = 0; i < n; i++) sink += sumLevels(BASELINE_VALUES);
		return sink;
	};
	// Warm up both paths so the JIT has compiled them before timing.
	evaluate(20_000);
	baseline(200_000);
	const opsPerSec = measure(evaluate, minMs);
	const baselineOpsPerSec = measure(baseline, minMs);
	return {
		name: 'acoustics.evaluatePackage (3 groups, 9 bands, boundary)',
		opsPerSec,
		baselineOpsPerSec,
		ratio: opsPerSec / baselineOpsPerSec
	};
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
	const result = runAcousticsBench();
	const fmt = (n: number) => Math.round(n).toLocaleString('en-GB');
	console.log(result.name);
	console.log(`  evaluations/s:      ${fmt(result.opsPerSec)}  (target ≥ 50,000)`);
	console.log(`  baseline ops/s:     ${fmt(result.baselineOpsPerSec)}  (sumLevels over 9 values)`);
	console.log(`  ratio:              ${result.ratio.toFixed(4)}  (evaluations per baseline op)`);
	if (!Number.isFinite(sink)) console.log('  (sink not finite)');
}

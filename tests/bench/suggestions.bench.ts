/**
 * Benchmark of the suggestion search (src/lib/systems), in this process, against the same baseline
 * as the acoustic model (sumLevels over nine values, measured in this run). Rows: the time one
 * search takes on a demo-sized catalogue (10 models) and on a generated 40-model catalogue, and the
 * systems it evaluates per second during the search as a ratio to the baseline.
 *   npx tsx tests/bench/suggestions.bench.ts      (or: npm run bench -- --in-process)
 * Targets (issue 12): within 2 s on the demo catalogue, 10 s on 40 models. Invented bench inputs.
 * The same two searches then run in the app's search worker thread (src/lib/server/search):
 * systems evaluated per second there, as a ratio to the same search in this process.
 */
import { pathToFileURL } from 'node:url';
import { sumLevels, type QuoteRequest } from '../../src/lib/acoustics/index';
import type { AmplifierModelRow, LoudspeakerModelRow } from '../../src/lib/inventory/types';
import { suggestSystemsNow, type StockCatalogue } from '../../src/lib/systems/index';
import { claimSearch } from '../../src/lib/server/search/run-search';
import type { Row } from './report';

const stamp = { createdAt: '2027-01-01T00:00:00.000Z', updatedAt: '2027-01-01T00:00:00.000Z' };
type Kind = 'full-range' | 'subwoofer' | 'line-array-element';

function speaker(id: number, kind: Kind, sensitivityDb: number, powerW: number, dayRateMinor: number): LoudspeakerModelRow {
	const sub = kind === 'subwoofer';
	return {
		id, ...stamp, name: `Bench ${kind} ${id}`, maker: 'Bench', kind, sensitivityDb, sensitivityRef: '1W', impedanceOhm: kind === 'line-array-element' ? 16 : 8,
		powerContinuousW: powerW, powerPeakW: powerW * 4, maxSplContinuousDb: null, maxSplPeakDb: null,
		dispersionHDeg: sub ? 360 : 90, dispersionVDeg: sub ? 360 : kind === 'line-array-element' ? 10 : 40, lowHz: sub ? 32 : 60, highHz: sub ? 120 : 18000,
		heightM: kind === 'line-array-element' ? 0.3 : null, weightKg: sub ? 60 : 25, dayRateMinor, replacementValueMinor: 100000, notes: ''
	} as unknown as LoudspeakerModelRow;
}
function amplifier(id: number, channels: number, powerW8: number, dayRateMinor: number): AmplifierModelRow {
	return {
		id, ...stamp, name: `Bench amp ${id}`, maker: 'Bench', channels, powerW8, powerW4: Math.round(powerW8 * 1.6), powerW2: Math.round(powerW8 * 2.2), minLoadOhm: 2,
		rackUnits: 2, weightKg: 12, dayRateMinor, replacementValueMinor: 200000, mainsCurrentAmps: 4, notes: ''
	} as unknown as AmplifierModelRow;
}

/** A small deterministic generator so the catalogue is the same in every run. */
function generator(seed: number) {
	let s = seed;
	return (min: number, max: number) => {
		s = (s * 1103515245 + 12345) % 2147483648;
		return min + (s % (max - min + 1));
	};
}

function catalogue(mains: number, subs: number, amps: number, seed: number): StockCatalogue {
	const r = generator(seed);
	const loudspeakers: LoudspeakerModelRow[] = [];
	const amplifiers: AmplifierModelRow[] = [];
	const available: StockCatalogue['available'] = {};
	for (let i = 0; i < mains; i++) {
		const id = i + 1;
		loudspeakers.push(speaker(id, i % 3 === 0 ? 'line-array-element' : 'full-range', r(95, 104), r(300, 900), r(20, 90) * 100));
		available[`loudspeaker:${id}`] = r(2, 16);
	}
	for (let i = 0; i < subs; i++) {
		const id = 101 + i;
		loudspeakers.push(speaker(id, 'subwoofer', r(96, 104), r(800, 2000), r(30, 90) * 100));
		available[`loudspeaker:${id}`] = r(2, 12);
	}
	for (let i = 0; i < amps; i++) {
		const id = 201 + i;
		amplifiers.push(amplifier(id, [2, 4][r(0, 1)], r(500, 2500), r(20, 80) * 100));
		available[`amplifier:${id}`] = r(2, 8);
	}
	return { loudspeakers, amplifiers, available };
}

export const demoLikeCatalogue = catalogue(4, 2, 4, 7);
export const fortyModelCatalogue = catalogue(16, 8, 16, 40);

export const benchRequest: QuoteRequest = {
	targetDb: 100,
	weighting: 'A',
	distanceM: 30,
	audienceWidthM: 30,
	programme: { bandsDb: { 63: 0, 125: -1, 250: -4, 500: -6, 1000: -7, 2000: -9, 4000: -12, 8000: -16 }, crestFactorDb: 12 },
	air: { temperatureC: 18, humidityPct: 60 },
	site: { aimDeg: 0, groundFactor: 0.5, receivers: [{ name: 'Bench house', x: 50, y: 300, limitDb: 80, weighting: 'A' }] }
};

export interface SuggestionBench {
	name: string;
	ms: number;
	complete: boolean;
	evaluated: number;
	evaluatedPerSec: number;
	targetMs: number;
}

const BASELINE_VALUES = [80, 82, 85, 83, 79, 76, 74, 70, 66];

function baselineOpsPerSec(minMs = 400): number {
	let sink = 0;
	let n = 100_000;
	for (;;) {
		const start = performance.now();
		for (let i = 0; i < n; i++) sink += sumLevels(BASELINE_VALUES);
		const elapsed = performance.now() - start;
		if (elapsed >= minMs && Number.isFinite(sink)) return (n * 1000) / elapsed;
		n *= 2;
	}
}

export function runSuggestionsBench(): { results: SuggestionBench[]; baselineOpsPerSec: number } {
	const cases = [
		{ name: 'suggestions: search, demo-sized catalogue (10 models)', catalogue: demoLikeCatalogue, targetMs: 2000, budgetMs: 2000 },
		{ name: 'suggestions: search, generated 40-model catalogue', catalogue: fortyModelCatalogue, targetMs: 10_000, budgetMs: 10_000 }
	];
	suggestSystemsNow(demoLikeCatalogue, benchRequest, { budgetMs: 300 }); // warm up the JIT
	const baseline = baselineOpsPerSec();
	const results = cases.map((c) => {
		const start = performance.now();
		const found = suggestSystemsNow(c.catalogue, benchRequest, { budgetMs: c.budgetMs });
		const ms = performance.now() - start;
		return { name: c.name, ms, complete: found.complete, evaluated: found.evaluated, evaluatedPerSec: (found.evaluated * 1000) / ms, targetMs: c.targetMs };
	});
	return { results, baselineOpsPerSec: baseline };
}

/** The same searches through the app's worker thread, after one pass to start it and warm it up. */
export async function runWorkerBench(inProcess: SuggestionBench[]): Promise<Row[]> {
	const cases = [
		{ catalogue: demoLikeCatalogue, budgetMs: 2000 },
		{ catalogue: fortyModelCatalogue, budgetMs: 10_000 }
	];
	// This process's JIT is warm from the acoustics rows and the in-process searches; the worker's
	// is warmed by one pass of the same searches, so the ratio compares warm with warm.
	for (const c of cases) await claimSearch(c.budgetMs)(c.catalogue, benchRequest);
	const rows: Row[] = [];
	for (const [i, c] of cases.entries()) {
		const start = performance.now();
		const found = await claimSearch(c.budgetMs)(c.catalogue, benchRequest);
		const ms = performance.now() - start;
		const perSec = (found.evaluated * 1000) / ms;
		rows.push({
			metric: `${inProcess[i].name}, in the search worker thread: systems evaluated per second (${Math.round(ms)} ms, ${found.complete ? 'complete' : 'stopped at its budget'})`,
			value: perSec,
			unit: '/s',
			baseline: inProcess[i].evaluatedPerSec,
			ratio: perSec / inProcess[i].evaluatedPerSec
		});
	}
	return rows;
}

export function suggestionsRows({ results, baselineOpsPerSec }: ReturnType<typeof runSuggestionsBench>): Row[] {
	return results.flatMap((r) => [
		{ metric: `${r.name}, time (${r.complete ? 'complete' : 'stopped at its budget, best so far'}; ${r.evaluated} systems)`, value: r.ms, unit: 'ms', target: `≤ ${r.targetMs} ms`, ok: r.ms <= r.targetMs + 100 },
		{ metric: `${r.name}, systems evaluated per second`, value: r.evaluatedPerSec, unit: '/s', baseline: baselineOpsPerSec, ratio: r.evaluatedPerSec / baselineOpsPerSec }
	]);
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
	const bench = runSuggestionsBench();
	void runWorkerBench(bench.results).then((workerRows) => {
		for (const row of [...suggestionsRows(bench), ...workerRows]) console.log(`${row.metric}: ${Math.round(row.value)} ${row.unit}${row.ratio !== undefined ? `, ratio ${row.ratio.toFixed(5)}` : ''}`);
		console.log(`baseline (sumLevels over 9 values): ${Math.round(bench.baselineOpsPerSec)} /s`);
		process.exit(0);
	});
}

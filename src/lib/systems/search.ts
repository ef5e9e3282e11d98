/**
 * Suggest: the cheapest systems in stock that are clear for a request. A system is a main group
 * (full-range or line-array elements) and optionally a subwoofer group, which may have a group
 * pattern of the house's (a cardioid arrangement). Chains of each role are sorted by their
 * cheapest member; a pair of chains is searched as a staircase (main count up, sub count down
 * from the last clear one), since more cabinets never lower capability: the fewest subs that meet
 * the target are found by bisection, then counts from there up are tried until one is clear at
 * every receiver too (receivers do not grow monotonically with the mix). A pair whose largest
 * system is short in headroom is hopeless and skipped after one evaluation.
 * Pure and deterministic; runs as a generator so a caller can report progress.
 */
import { evaluatePackage, OUTCOME_ORDER, type Evaluation, type QuoteRequest } from '../acoustics';
import { toPackageSpec, type LoadedGroup } from '../inventory';
import { chainsOf, dayCost, groupOf, unitsOverStock, type Chain, type StockCatalogue } from './chains';

export const DEFAULT_BUDGET_MS = 2000;
/** The targets: 2 s on a catalogue the size of the demo's (15 models), 10 s on 40 models. */
const BUDGET_AT = { models: 15, ms: DEFAULT_BUDGET_MS, largeModels: 40, largeMs: 10_000 } as const;

/** How long a search over `models` loudspeaker and amplifier models in stock may run, ms. */
export function searchBudgetMs(models: number): number {
	const { models: small, ms, largeModels, largeMs } = BUDGET_AT;
	if (models <= small) return ms;
	return Math.round(Math.min(largeMs, ms + ((models - small) * (largeMs - ms)) / (largeModels - small)));
}
export const MAX_SYSTEMS = 5;

export interface Candidate {
	groups: LoadedGroup[];
	dayCostMinor: number;
	evaluation: Evaluation;
}

export interface Obstacles {
	/** Bands short (headroom below the margin) even in the largest system of every chain tried. */
	bandsShort: { hz: number; bestHeadroomDb: number }[];
	/** The receiver over its limit in the cheapest system that otherwise meets the target. */
	receiverOver: { name: string; maxTargetDb: number | null } | null;
	/** Models whose free units the closest system uses up. */
	modelsRunOut: string[];
}

export interface SearchResult {
	clear: Candidate[];
	closest: Candidate[];
	complete: boolean;
	evaluated: number;
	obstacles: Obstacles | null;
}

export interface SearchOptions {
	budgetMs?: number;
	now?: () => number;
	/** Yield a progress count every this many evaluations (the deadline is checked after each). */
	yieldEvery?: number;
}

const rankOf = (c: Candidate) => OUTCOME_ORDER.indexOf(c.evaluation.outcome);
const closer = (a: Candidate, b: Candidate) => rankOf(a) - rankOf(b) || b.evaluation.headroomDb - a.evaluation.headroomDb || a.dayCostMinor - b.dayCostMinor;

/** The cabinets a system puts out, whatever amplifiers drive them: systems the desk would call the same. */
function cabinetsKey(c: Candidate): string {
	return c.groups.map((g) => `${g.loudspeaker.id}:${g.count}x${g.stacks}`).join('+');
}

/** Keeps the best five by `order`, and of systems with the same cabinets only the better one. */
function keep(list: Candidate[], c: Candidate, order: (a: Candidate, b: Candidate) => number): void {
	const same = list.findIndex((other) => cabinetsKey(other) === cabinetsKey(c));
	if (same >= 0) {
		if (order(c, list[same]) >= 0) return;
		list.splice(same, 1);
	}
	list.push(c);
	list.sort(order);
	if (list.length > MAX_SYSTEMS) list.pop();
}

const byCost = (a: Candidate, b: Candidate) => a.dayCostMinor - b.dayCostMinor;

export function* searchSystems(catalogue: StockCatalogue, request: QuoteRequest, options: SearchOptions = {}): Generator<number, SearchResult> {
	const now = options.now ?? (() => Date.now());
	const deadline = now() + (options.budgetMs ?? DEFAULT_BUDGET_MS);
	const yieldEvery = options.yieldEvery ?? 64;
	const margin = request.marginDb ?? 3;
	const mains = chainsOf(catalogue, 'main');
	const subs: (Chain | null)[] = [null, ...chainsOf(catalogue, 'sub')];
	const maxAmpRate = Math.max(0, ...catalogue.amplifiers.map((a) => a.dayRateMinor));
	const clear: Candidate[] = [];
	const closest: Candidate[] = [];
	const bestBand = new Map<number, number>();
	let evaluated = 0;
	let complete = true;

	const bound = () => (clear.length < MAX_SYSTEMS ? Infinity : clear[MAX_SYSTEMS - 1].dayCostMinor);
	function evaluate(groups: LoadedGroup[], record = true, inStockOnly = true): Candidate | null {
		if (inStockOnly && unitsOverStock(groups, catalogue).length > 0) return null;
		evaluated++;
		let evaluation: Evaluation;
		try {
			evaluation = evaluatePackage(toPackageSpec({ groups }), request);
		} catch {
			return null; // a plan the model refuses is no system
		}
		const c = { groups, dayCostMinor: dayCost(groups), evaluation };
		if (!record) return c;
		if (evaluation.outcome === 'clear') keep(clear, c, byCost);
		else keep(closest, c, closer);
		return c;
	}
	const build = (main: Chain, m: number, sub: Chain | null, s: number) =>
		sub ? [groupOf(main, m, 0), groupOf(sub, s, 1)] : [groupOf(main, m, 0)];
	const meetsTarget = (c: Candidate) => c.evaluation.verdict === 'clear';

	// Pairs of chains in ascending order of their cheapest members' sum (the pair's floor, up to
	// one shared amplifier): cheap systems are tried first, so the bound tightens early and a search
	// stopped at its budget holds the cheapest found so far.
	const pairs = new PairQueue(mains.map((m) => m.minDayCost), subs.map((s) => s?.minDayCost ?? 0));
	search: for (let next = pairs.pop(); next; next = pairs.pop()) {
		if (next.sum - maxAmpRate >= bound()) break;
		const main = mains[next.i];
		{
			const sub = subs[next.j];
			const floor = main.minDayCost + (sub?.minDayCost ?? 0) - (sub && sub.amplifier.id === main.amplifier.id ? maxAmpRate : 0);
			if (floor >= bound()) continue;
			// The largest system of the pair, stock or not: capability only grows with cabinets, so if even
			// it is short of the margin every system of the pair is, and the pair is hopeless. (It may need
			// more amplifiers than the two groups can share; it is a bound then, never a candidate.)
			const largestGroups = build(main, main.maxCount, sub, sub?.maxCount ?? 0);
			const largest = evaluate(largestGroups, false, false);
			if (largest) for (const b of largest.evaluation.bands) bestBand.set(b.hz, Math.max(bestBand.get(b.hz) ?? -Infinity, b.headroomDb));
			yield evaluated;
			if (now() > deadline) {
				complete = false;
				break search;
			}
			if (!largest) continue;
			if (!meetsTarget(largest)) {
				if (unitsOverStock(largestGroups, catalogue).length === 0) keep(closest, largest, closer);
				continue;
			}
			let sTop = sub?.maxCount ?? 0;
			const sMin = sub?.minCount ?? 0;
			for (let m = main.minCount; m <= main.maxCount; m++) {
				const fits = (s: number) => unitsOverStock(build(main, m, sub, s), catalogue).length === 0;
				if (!fits(sMin)) break; // more mains need more units still
				let hi = sTop;
				while (hi >= sMin && (!fits(hi) || dayCost(build(main, m, sub, hi)) >= bound())) hi--;
				const top = hi;
				// Fewest subs that meet the target with this main count: a binary search, since more never
				// lowers capability.
				let lo = sMin;
				let lowest: number | null = null;
				while (lo <= hi) {
					const mid = (lo + hi) >> 1;
					const c = evaluate(build(main, m, sub, mid), false);
					if (evaluated % yieldEvery === 0) yield evaluated;
					// The clock after every evaluation: a large system with a site can take milliseconds.
					if (now() > deadline) { complete = false; break search; }
					if (c && meetsTarget(c)) {
						lowest = mid;
						hi = mid - 1;
					} else {
						if (c) keep(closest, c, closer);
						lo = mid + 1;
					}
				}
				if (lowest === null) continue;
				// Receivers are not monotone in the mix (more subs can push a neighbour over, a group
				// pattern can pull it back), so from the fewest up each count is tried until one is clear.
				let clearAt: number | null = null;
				for (let s = lowest; s <= top; s++) {
					if (s > lowest && dayCost(build(main, m, sub, s)) >= bound()) break;
					const c = evaluate(build(main, m, sub, s));
					if (evaluated % yieldEvery === 0) yield evaluated;
					// The clock after every evaluation: a large system with a site can take milliseconds.
					if (now() > deadline) { complete = false; break search; }
					if (c?.evaluation.outcome === 'clear') {
						clearAt = s;
						break;
					}
				}
				if (clearAt === null) continue;
				if (clearAt === sMin) break; // more mains only cost more
				sTop = clearAt - 1; // the staircase: with more mains only fewer subs can be cheaper
			}
		}
	}
	return { clear, closest, complete, evaluated, obstacles: clear.length > 0 ? null : obstaclesOf(closest, bestBand, margin, catalogue) };
}

/** Pairs (i, j) of two ascending cost lists, popped in ascending order of a[i] + b[j]. */
class PairQueue {
	private heap: { i: number; j: number; sum: number }[] = [];
	constructor(
		private readonly a: readonly number[],
		private readonly b: readonly number[]
	) {
		if (b.length > 0) a.forEach((cost, i) => this.push({ i, j: 0, sum: cost + b[0] }));
	}
	pop(): { i: number; j: number; sum: number } | undefined {
		const top = this.heap[0];
		if (!top) return undefined;
		const last = this.heap.pop()!;
		if (this.heap.length > 0) {
			this.heap[0] = last;
			this.down(0);
		}
		if (top.j + 1 < this.b.length) this.push({ i: top.i, j: top.j + 1, sum: this.a[top.i] + this.b[top.j + 1] });
		return top;
	}
	private before(x: { i: number; j: number; sum: number }, y: { i: number; j: number; sum: number }): boolean {
		return x.sum < y.sum || (x.sum === y.sum && (x.i < y.i || (x.i === y.i && x.j < y.j)));
	}
	private push(item: { i: number; j: number; sum: number }): void {
		const h = this.heap;
		h.push(item);
		let k = h.length - 1;
		while (k > 0) {
			const parent = (k - 1) >> 1;
			if (!this.before(h[k], h[parent])) break;
			[h[k], h[parent]] = [h[parent], h[k]];
			k = parent;
		}
	}
	private down(k: number): void {
		const h = this.heap;
		for (;;) {
			const l = 2 * k + 1;
			const r = l + 1;
			let m = k;
			if (l < h.length && this.before(h[l], h[m])) m = l;
			if (r < h.length && this.before(h[r], h[m])) m = r;
			if (m === k) return;
			[h[k], h[m]] = [h[m], h[k]];
			k = m;
		}
	}
}

function obstaclesOf(closest: Candidate[], bestBand: Map<number, number>, margin: number, catalogue: StockCatalogue): Obstacles {
	const bandsShort = [...bestBand].filter(([, h]) => h < margin).map(([hz, bestHeadroomDb]) => ({ hz, bestHeadroomDb })).sort((a, b) => a.hz - b.hz);
	const meeting = closest.filter((c) => c.evaluation.verdict === 'clear').sort(byCost)[0];
	const binding = meeting?.evaluation.limits.bindingReceiver ?? null;
	const first = closest[0];
	const modelsRunOut = first
		? first.groups
				.filter((g) => g.count * g.stacks >= (catalogue.available[`loudspeaker:${g.loudspeaker.id}`] ?? 0) - (g.stacks - 1))
				.map((g) => g.loudspeaker.name)
		: [];
	return {
		bandsShort,
		receiverOver: binding ? { name: binding, maxTargetDb: meeting!.evaluation.limits.maxTargetDb } : null,
		modelsRunOut
	};
}

/** Runs the search to its end (or its time budget) on this thread. */
export function suggestSystemsNow(catalogue: StockCatalogue, request: QuoteRequest, options: SearchOptions = {}): SearchResult {
	const steps = searchSystems(catalogue, request, options);
	for (;;) {
		const step = steps.next();
		if (step.done) return step.value;
	}
}

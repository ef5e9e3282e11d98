/**
 * Runs the suggestion search off the request thread: one long-lived worker thread per process,
 * started at the first search, taking one search at a time. Why one and not more: a search is
 * seconds of pure CPU, the app runs one process per core or fewer, and the request thread needs a
 * core of its own to stay responsive; a second search while one runs is refused at once with 503
 * and Retry-After (the desk waits seconds, not behind a queue). Why long-lived: starting a worker
 * and loading the search costs from tens of milliseconds to a second on a busy machine, which a
 * 2-second budget cannot spare. A worker that overruns its deadline by GRACE_MS is stopped and
 * the next search starts a fresh one.
 */
import { existsSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { Worker } from 'node:worker_threads';
import type { QuoteRequest } from '$lib/acoustics';
import type { SearchResult, StockCatalogue } from '$lib/systems';
import { DomainError } from '../services/errors';
import type { SearchJob, SearchMessage } from './messages';

/** Searches running at once in this process. */
export const MAX_SEARCHES = 1;
/** Beyond its deadline, how long the worker may take to answer before it is stopped. */
const GRACE_MS = 3000;

/** Refused because the process already runs its share of searches. */
export class SearchBusyError extends DomainError {
	constructor(readonly retryAfterSeconds: number) {
		super(503, `Another search of the stock is running; try again in ${retryAfterSeconds} s.`);
	}
}

/**
 * The worker's script: the bundled BUILD_DIR/server/search-worker.js in the built app (found by
 * walking up from this chunk); under vitest and `vite dev` the TypeScript source, loaded through
 * tsx's API by a one-line bootstrap (a worker does not inherit the test runner's transforms).
 */
function workerScript(): { script: string | URL; eval: boolean } {
	const here = fileURLToPath(import.meta.url);
	if (here.endsWith('.ts')) {
		const source = JSON.stringify(new URL('./search-worker.ts', import.meta.url).href);
		return { script: `import('tsx/esm/api').then((tsx) => tsx.tsImport(${source}, ${source}));`, eval: true };
	}
	for (let dir = path.dirname(here); ; dir = path.dirname(dir)) {
		const candidate = path.join(dir, 'search-worker.js');
		if (existsSync(candidate)) return { script: pathToFileURL(candidate), eval: false };
		if (path.dirname(dir) === dir) throw new Error('search-worker.js is missing from the build');
	}
}

interface Running {
	id: number;
	deadlineAt: number;
	onProgress?: (evaluated: number) => void;
	resolve: (result: SearchResult) => void;
	reject: (err: Error) => void;
	timer: ReturnType<typeof setTimeout>;
}

let worker: Worker | null = null;
let running: Running | null = null;
let claimed = 0;
let nextId = 1;

function settle(outcome: { result: SearchResult } | { error: Error }): void {
	const job = running;
	if (!job) return;
	running = null;
	claimed--;
	clearTimeout(job.timer);
	if ('result' in outcome) job.resolve(outcome.result);
	else job.reject(outcome.error);
}

function stopWorker(reason: Error): void {
	const old = worker;
	worker = null;
	settle({ error: reason });
	void old?.terminate();
}

function startedWorker(): Worker {
	if (worker) return worker;
	const { script, eval: isEval } = workerScript();
	const started = new Worker(script, { eval: isEval });
	started.unref(); // an idle search thread never keeps the app from exiting
	started.on('message', (message: SearchMessage) => {
		if (!running || message.id !== running.id) return;
		if ('progress' in message) {
			try {
				running.onProgress?.(message.progress);
			} catch {
				// A listener whose answer has gone (the client left) must not take the process down.
			}
		}
		else settle({ result: message.result });
	});
	started.on('error', (err) => worker === started && stopWorker(err));
	started.on('exit', (code) => worker === started && stopWorker(new Error(`the search worker stopped (${code})`)));
	worker = started;
	return started;
}

/**
 * Takes the process's place for a search or refuses at once (before any answer has started, so
 * the route can still say 503); the deadline counts from now. The returned function runs the
 * search and must be called: the place is given back when the search ends.
 */
export function claimSearch(budgetMs: number): (catalogue: StockCatalogue, request: QuoteRequest, onProgress?: (evaluated: number) => void) => Promise<SearchResult> {
	if (claimed >= MAX_SEARCHES) {
		const until = running?.deadlineAt ?? Date.now() + 1000;
		throw new SearchBusyError(Math.max(1, Math.ceil((until - Date.now()) / 1000)));
	}
	claimed++;
	const deadlineAt = Date.now() + budgetMs;
	let used = false;
	return (catalogue, request, onProgress) => {
		if (used) throw new Error('a claimed search runs once');
		used = true;
		return new Promise<SearchResult>((resolve, reject) => {
			const id = nextId++;
			const timer = setTimeout(() => stopWorker(new Error('the search worker overran its deadline')), deadlineAt - Date.now() + GRACE_MS);
			running = { id, deadlineAt, onProgress, resolve, reject, timer };
			try {
				const job: SearchJob = { id, catalogue, request, deadlineAt };
				startedWorker().postMessage(job);
			} catch (err) {
				settle({ error: err as Error });
			}
		});
	};
}

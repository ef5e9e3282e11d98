/**
 * bcrypt on a worker thread. bcryptjs's async API still runs on the main thread (in 100 ms slices),
 * so a burst of sign-ins made every other request wait behind the hashing; here the hashing runs
 * on its own thread and the event loop stays free. One worker is enough: requests queue in order,
 * and sign-in throttling bounds how many can arrive.
 */
import { createRequire } from 'node:module';
import { Worker } from 'node:worker_threads';

type Job = { op: 'hash'; plain: string; cost: number } | { op: 'compare'; plain: string; hash: string };

// Plain CommonJS evaluated in the worker; bcryptjs is resolved here, where node_modules is known.
const WORKER_SOURCE = `
const { parentPort, workerData } = require('node:worker_threads');
const bcrypt = require(workerData.bcryptPath);
parentPort.on('message', ({ id, job }) => {
	try {
		const result = job.op === 'hash' ? bcrypt.hashSync(job.plain, job.cost) : bcrypt.compareSync(job.plain, job.hash);
		parentPort.postMessage({ id, result });
	} catch (err) {
		parentPort.postMessage({ id, error: String((err && err.message) || err) });
	}
});`;

let worker: Worker | null = null;
let nextId = 1;
const pending = new Map<number, { resolve: (value: unknown) => void; reject: (err: Error) => void }>();

function failAll(err: Error): void {
	for (const job of pending.values()) job.reject(err);
	pending.clear();
	worker = null;
}

function theWorker(): Worker {
	if (worker) return worker;
	const bcryptPath = createRequire(import.meta.url).resolve('bcryptjs');
	const made = new Worker(WORKER_SOURCE, { eval: true, workerData: { bcryptPath } });
	made.unref(); // never keeps the process alive on its own
	made.on('message', ({ id, result, error }: { id: number; result?: unknown; error?: string }) => {
		const job = pending.get(id);
		pending.delete(id);
		if (pending.size === 0) made.unref();
		if (error !== undefined) job?.reject(new Error(error));
		else job?.resolve(result);
	});
	made.on('error', (err) => failAll(err));
	made.on('exit', (code) => {
		if (worker === made) failAll(new Error(`password worker stopped (${code})`));
	});
	worker = made;
	return made;
}

function run<T>(job: Job): Promise<T> {
	const w = theWorker();
	const id = nextId++;
	w.ref(); // keep it alive while work is queued
	return new Promise<T>((resolve, reject) => {
		pending.set(id, { resolve: resolve as (value: unknown) => void, reject });
		w.postMessage({ id, job });
	});
}

export const hashOffThread = (plain: string, cost: number) => run<string>({ op: 'hash', plain, cost });
export const compareOffThread = (plain: string, hash: string) => run<boolean>({ op: 'compare', plain, hash });

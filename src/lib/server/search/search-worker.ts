/**
 * The suggestion search in its own thread (node:worker_threads), so a long search never holds up
 * the app's event loop. Takes one job at a time (the stock catalogue and the model request),
 * posts `{ progress }` now and then and `{ result }` once. Imports only the pure search: no
 * database. Built to BUILD_DIR/server/search-worker.js (vite.config.ts, scripts/adapter-node-headers.js).
 */
import { parentPort } from 'node:worker_threads';
import { searchSystems } from '../../systems/search';
import type { SearchJob, SearchMessage } from './messages';

const PROGRESS_EVERY_MS = 100;

function run(job: SearchJob, post: (message: SearchMessage) => void): void {
	// The budget counts from when the request asked, so time spent waiting for this thread counts too.
	const steps = searchSystems(job.catalogue, job.request, { budgetMs: Math.max(0, job.deadlineAt - Date.now()) });
	let lastPost = Date.now();
	for (;;) {
		const step = steps.next();
		if (step.done) return post({ id: job.id, result: step.value });
		const now = Date.now();
		if (now - lastPost >= PROGRESS_EVERY_MS) {
			lastPost = now;
			post({ id: job.id, progress: step.value });
		}
	}
}

const port = parentPort;
if (port) port.on('message', (job: SearchJob) => run(job, (message) => port.postMessage(message)));

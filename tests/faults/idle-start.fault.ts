/**
 * A freshly started app that nobody has asked anything yet still runs its mail retry timer. The
 * timer's first passes must find the database models ready; before the fix every pass failed with
 * "Cannot convert undefined or null to object" until the first request happened to open the pool.
 */
import { closeSync, openSync, readFileSync } from 'node:fs';
import { afterAll, describe, expect, it } from 'vitest';
import { startDetached, stop } from '../bench/proc';
import { world } from './world-info';

// A second app process beside the world's own, on a port of its own, from the same build copy.
const PORT = '3409';
const LOG = '.data/faults/run/idle-app.log';
let app: ReturnType<typeof startDetached> | null = null;

afterAll(async () => {
	if (app) await stop(app);
});

describe('an app that has had no request yet', () => {
	it('runs retry passes without errors', async () => {
		const env = { ...world().env, PORT, ORIGIN: `http://127.0.0.1:${PORT}`, MAIL_RETRY_MS: '200' };
		const fd = openSync(LOG, 'w');
		app = startDetached('node', ['.data/faults/build'], env, fd);
		closeSync(fd);

		// Several passes (every 200 ms) while no request reaches the app.
		await new Promise((r) => setTimeout(r, 2500));
		expect(app.exitCode, readFileSync(LOG, 'utf8')).toBeNull();
		const health = await fetch(`http://127.0.0.1:${PORT}/api/health`);
		expect(health.status).toBe(200);
		expect(readFileSync(LOG, 'utf8')).not.toContain('[mail-retry] pass failed');
	});
});

/**
 * MariaDB stopped while the app runs: every answer comes fast and calm (503, no stack trace), and
 * when the database is back the same app process recovers without a restart.
 */
import { afterAll, describe, expect, it } from 'vitest';
import { signatureHeader } from '../fakes/stripe/webhooks';
import { api, DEMO_PASSWORD, eventually, page, SALES, signIn, timedFetch } from './http';
import { world } from './world-info';
import { startDatabase, stopDatabase } from './services';

const FAST_MS = 3500;
const STACK_TRACE = /\bat [\w.<>]+ \(|node_modules|\.js:\d+:\d+|SequelizeConnection|ECONNREFUSED/;

afterAll(async () => {
	await startDatabase(); // whatever happened, leave the world running
});

describe('the database stops and comes back while the app runs', () => {
	let sales = '';

	it('answers calmly while MariaDB is down', async () => {
		sales = await signIn(SALES); // before the outage: signing in needs the database
		// A request now leaves the user row in the app's 5 s cache, so the first round below gets
		// past the user lookup and meets the stopped database in the page's own queries.
		expect((await api('/api/quotes', { cookie: sales })).status).toBe(200);
		const stoppedIn = await stopDatabase();
		console.log(`[faults] MariaDB stopped in ${stoppedIn} s`);

		const health = await api('/api/health');
		expect(health.status).toBe(503);
		expect(health.json).toEqual({ status: 'degraded', db: 'down' });
		expect(health.ms).toBeLessThan(FAST_MS);

		const home = await page('/', sales);
		expect(home.status).toBe(503);
		expect(home.contentType).toMatch(/text\/html/);
		expect(home.text).toMatch(/catching its breath/i);
		expect(home.text).toMatch(/try again shortly/i);
		expect(home.text).not.toMatch(STACK_TRACE);
		expect(home.ms).toBeLessThan(FAST_MS);

		const quotes = await api('/api/quotes', { cookie: sales });
		expect(quotes.status).toBe(503);
		expect(quotes.contentType).toMatch(/application\/json/);
		expect(quotes.json.message).toMatch(/database is not answering/i);
		expect(quotes.text).not.toMatch(STACK_TRACE);
		expect(quotes.ms).toBeLessThan(FAST_MS);

		// A correctly signed Stripe event cannot be applied now: 503 so Stripe delivers it again later.
		const event = JSON.stringify({
			id: `evt_db_down_${Date.now()}`,
			object: 'event',
			type: 'invoice.paid',
			data: { object: { id: 'in_db_down' } }
		});
		const webhook = await timedFetch(`${world().origin}/api/webhooks/stripe`, {
			method: 'POST',
			headers: {
				'content-type': 'application/json',
				'stripe-signature': signatureHeader(event, world().env.STRIPE_WEBHOOK_SECRET)
			},
			body: event
		});
		expect(webhook.status).toBe(503);
		expect(webhook.ms).toBeLessThan(FAST_MS);

		// A second round once the cached user row has expired: now the user lookup itself fails.
		await new Promise((r) => setTimeout(r, 5500));
		const again = await page('/quotes', sales);
		expect(again.status).toBe(503);
		expect(again.text).toMatch(/catching its breath/i);
		expect(again.ms).toBeLessThan(FAST_MS);
		console.log(
			`[faults] db down: health ${health.ms} ms, page ${home.ms} ms / ${again.ms} ms, API ${quotes.ms} ms, webhook ${webhook.ms} ms`
		);
	});

	it('signing in while MariaDB is down says so on the form (503), without a stack trace', async () => {
		const { origin } = world();
		const answer = await timedFetch(`${origin}/signin`, {
			method: 'POST',
			redirect: 'manual',
			headers: { origin, accept: 'text/html', 'content-type': 'application/x-www-form-urlencoded' },
			body: new URLSearchParams({ email: SALES, password: DEMO_PASSWORD, redirectTo: '/' })
		});
		expect(answer.status).toBe(503);
		expect(answer.text).toMatch(/database is not answering/i);
		expect(answer.text).not.toMatch(STACK_TRACE);
		expect(answer.ms).toBeLessThan(FAST_MS);
		console.log(`[faults] db down: sign-in answered 503 on the form in ${answer.ms} ms`);
	});

	it('recovers without a restart once MariaDB is back', async () => {
		const startedIn = await startDatabase();
		const started = performance.now();
		const health = await eventually(
			'health 200 after the database restart',
			async () => {
				const answer = await api('/api/health');
				return answer.status === 200 ? answer : undefined;
			},
			15_000
		);
		expect(health.json).toEqual({ status: 'ok', db: 'ok' });
		const recoveredMs = Math.round(performance.now() - started);

		const fresh = await signIn(SALES);
		const evaluation = await api('/api/evaluations', {
			cookie: fresh,
			method: 'POST',
			timeoutMs: 10_000,
			body: {
				targetDb: 90,
				weighting: 'A',
				distance: 20,
				distanceUnit: 'm',
				programme: 'speech',
				startDate: '2034-03-01',
				endDate: '2034-03-01'
			}
		});
		expect(evaluation.status, evaluation.text).toBe(200);
		expect(evaluation.json.results.length).toBeGreaterThan(0);

		// The session from before the outage still works too.
		const quotes = await api('/api/quotes', { cookie: sales });
		expect(quotes.status).toBe(200);
		console.log(
			`[faults] MariaDB started in ${startedIn} s; app healthy ${recoveredMs} ms later; evaluation ${evaluation.ms} ms`
		);
	});
});

// The Stripe stand-in's refusals and test-only controls: API keys, idempotency, simulated outage and
// latency, webhook retries and replays, and state kept across a restart.
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Stripe from 'stripe';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { startFakeStripe, type FakeStripe } from './stripe/server';
import { startWebhookListener, type WebhookListener } from './stripe/testing';

const KEY = 'sk_test_fake_faults';
const SECRET = 'whsec_fake_faults_secret';

let fake: FakeStripe;
let hooks: WebhookListener;
let stripe: Stripe;

const client = (key = KEY, extra: Partial<Stripe.StripeConfig> = {}) =>
	new Stripe(key, { host: '127.0.0.1', port: fake.port, protocol: 'http', ...extra });

async function control(path: string, body?: unknown) {
	const res = await fetch(
		`${fake.url}/_fake/${path}`,
		body === undefined
			? {}
			: {
					method: 'POST',
					headers: { 'content-type': 'application/json' },
					body: JSON.stringify(body)
				}
	);
	return { status: res.status, json: (await res.json()) as Record<string, unknown> };
}

interface EventWithDelivery {
	id: string;
	type: string;
	delivery: { status: string; attempts: { status: number | null; ok: boolean }[] };
}

beforeAll(async () => {
	hooks = await startWebhookListener();
	fake = await startFakeStripe({
		port: 0,
		apiKey: KEY,
		webhookSecret: SECRET,
		webhookUrl: hooks.url,
		webhookRetryDelaysMs: [30, 30]
	});
	stripe = client();
});

afterAll(async () => {
	await fake?.close();
	await hooks?.close();
});

beforeEach(async () => {
	await control('reset', {});
	hooks.received.length = 0;
	hooks.respondWith.length = 0;
});

describe('fake Stripe refusals and test controls', () => {
	it('answers a wrong or missing key with 401, which the SDK raises as StripeAuthenticationError', async () => {
		await expect(client('sk_test_not_the_key').customers.create({})).rejects.toBeInstanceOf(
			Stripe.errors.StripeAuthenticationError
		);
		await expect(client('sk_live_whatever').customers.create({})).rejects.toMatchObject({
			statusCode: 401,
			type: 'StripeAuthenticationError'
		});
		const res = await fetch(`${fake.url}/v1/customers`);
		expect(res.status).toBe(401);
		expect(
			((await res.json()) as { error: { type: string; message: string } }).error
		).toMatchObject({
			type: 'invalid_request_error',
			message: expect.stringContaining('did not provide an API key')
		});
	});

	it('replays a POST with the same Idempotency-Key and refuses the key with other parameters', async () => {
		const first = await stripe.customers.create(
			{ email: 'once@client.test' },
			{ idempotencyKey: 'quote-17-customer' }
		);
		const again = await stripe.customers.create(
			{ email: 'once@client.test' },
			{ idempotencyKey: 'quote-17-customer' }
		);
		expect(again.id).toBe(first.id);
		expect(again.lastResponse.headers['idempotent-replayed']).toBe('true');
		expect((await stripe.customers.list()).data).toHaveLength(1);
		await expect(
			stripe.customers.create(
				{ email: 'other@client.test' },
				{ idempotencyKey: 'quote-17-customer' }
			)
		).rejects.toBeInstanceOf(Stripe.errors.StripeIdempotencyError);
	});

	it('failNext makes the next calls answer 500; the SDK retries twice by default, then throws StripeAPIError', async () => {
		expect((await control('config', { failNext: 3 })).json.failNext).toBe(3);
		const err = await stripe.customers
			.create({ email: 'down@client.test' })
			.catch((e: unknown) => e);
		expect(err).toBeInstanceOf(Stripe.errors.StripeAPIError);
		expect(err).toMatchObject({ statusCode: 500 });
		expect((await control('config')).json.failNext).toBe(0);

		await control('config', { failNext: 1 });
		await expect(client(KEY, { maxNetworkRetries: 0 }).customers.create({})).rejects.toBeInstanceOf(
			Stripe.errors.StripeAPIError
		);
		await control('config', { failNext: 1 });
		// One failure is absorbed by the SDK's own retry (same Idempotency-Key, so nothing is created twice).
		await stripe.customers.create({ email: 'retried@client.test' });
		expect((await stripe.customers.list()).data.map((c) => c.email)).toEqual([
			'retried@client.test'
		]);
	});

	it('delayMs slows every API answer, enough to trip a client timeout', async () => {
		await control('config', { delayMs: 400 });
		const started = Date.now();
		await stripe.customers.create({});
		expect(Date.now() - started).toBeGreaterThanOrEqual(380);
		await expect(
			client(KEY, { timeout: 100, maxNetworkRetries: 0 }).customers.create({})
		).rejects.toBeInstanceOf(Stripe.errors.StripeConnectionError);
		await control('config', { delayMs: 0 });
		// The timed-out request still completes on the fake; let it land before the next test resets.
		await new Promise((r) => setTimeout(r, 450));
	});

	it('retries a failed webhook delivery a bounded number of times and records every attempt', async () => {
		hooks.respondWith.push(500, 503);
		await stripe.customers.create({});
		const hook = await hooks.waitFor('customer.created');
		const [delivered] = (await control('events')).json.data as EventWithDelivery[];
		expect(delivered.id).toBe(hook.id);
		expect(delivered.delivery.status).toBe('delivered');
		expect(delivered.delivery.attempts.map((a) => a.status)).toEqual([500, 503, 200]);

		hooks.respondWith.push(500, 500, 500);
		await stripe.customers.create({});
		let latest: EventWithDelivery | undefined;
		for (let i = 0; i < 100 && latest?.delivery.status !== 'failed'; i++) {
			await new Promise((r) => setTimeout(r, 20));
			[latest] = (await control('events?type=customer.created')).json.data as EventWithDelivery[];
		}
		if (!latest) throw new Error('no event recorded');
		expect(latest.delivery).toMatchObject({ status: 'failed' });
		expect(latest.delivery.attempts.map((a) => a.status)).toEqual([500, 500, 500]);
	});

	it('resends one event on request (replay), with a fresh valid signature', async () => {
		const customer = await stripe.customers.create({});
		const hook = await hooks.waitFor('customer.created');
		const resent = await control(`events/${hook.id}/resend`, {});
		expect(resent.status).toBe(200);
		expect(resent.json.attempt).toMatchObject({ ok: true, status: 200 });
		const copies = hooks.received.filter((h) => h.id === hook.id);
		expect(copies).toHaveLength(2);
		const replayed = stripe.webhooks.constructEvent(copies[1].raw, copies[1].signature, SECRET);
		expect((replayed.data.object as Stripe.Customer).id).toBe(customer.id);
		expect((await control('events/evt_missing/resend', {})).status).toBe(404);
	});

	it('keeps its state in a file across a restart', async () => {
		const dir = await mkdtemp(join(tmpdir(), 'stripe-fake-'));
		const statePath = join(dir, 'state.json');
		try {
			const first = await startFakeStripe({
				port: 0,
				webhookSecret: SECRET,
				webhookUrl: '',
				statePath
			});
			const created = await new Stripe('sk_test_any', {
				host: '127.0.0.1',
				port: first.port,
				protocol: 'http'
			}).customers.create({ name: 'Kept' });
			await first.close();
			const second = await startFakeStripe({
				port: 0,
				webhookSecret: SECRET,
				webhookUrl: '',
				statePath
			});
			const again = await new Stripe('sk_test_other', {
				host: '127.0.0.1',
				port: second.port,
				protocol: 'http'
			}).customers.retrieve(created.id);
			expect((again as Stripe.Customer).name).toBe('Kept');
			await second.close();
		} finally {
			await rm(dir, { recursive: true, force: true });
		}
	});
});

/**
 * The Stripe stand-in failing or slow when the client accepts: a clear "payment service" answer
 * within bounded time and nothing half-made (no invoice, no booking, no deposit e-mail, quote still
 * sent); once the service is well again the same accept works and makes exactly one invoice.
 */
import { afterAll, afterEach, describe, expect, it } from 'vitest';
import { api, signIn, timedFetch } from './http';
import { CLIENT_SCHOOL, deskView, sentQuote } from './quotes';
import { scalar, stripeFaults } from './services';
import { world } from './world-info';

const PAYMENT_SERVICE = /payment service/i;

afterEach(async () => {
	await stripeFaults({ failNext: 0, delayMs: 0 });
});
afterAll(async () => {
	await stripeFaults({ failNext: 0, delayMs: 0 });
});

/** Nothing of an accept may remain after a refused one. */
async function expectNothingHalfMade(id: number): Promise<void> {
	const quote = await deskView(id);
	expect(quote.status).toBe('sent');
	expect(quote.invoices).toEqual([]);
	expect(quote.emails.filter((e) => /invoice for the deposit/i.test(e.subject))).toEqual([]);
	expect(await scalar('SELECT COUNT(*) FROM invoices WHERE quoteId = ?', [id])).toBe(0);
	expect(await scalar('SELECT COUNT(*) FROM bookings WHERE quoteId = ?', [id])).toBe(0);
}

/** How many invoices the stand-in finalized for a quote (each accept may finalize at most one). */
async function finalizedOnStripe(id: number): Promise<number> {
	const answer = await timedFetch(`${world().stripeApi}/_fake/events?type=invoice.finalized`);
	const events = answer.json.data as { data: { object: { metadata?: Record<string, string> } } }[];
	return events.filter((e) => e.data.object.metadata?.quoteId === String(id)).length;
}

async function accept(id: number, client: string, timeoutMs: number) {
	return api(`/api/quotes/${id}/actions`, {
		cookie: client,
		method: 'POST',
		body: { action: 'accept', acceptTerms: true },
		timeoutMs
	});
}

describe('the payment service fails or is slow when the client accepts', () => {
	it('an outage (every call a 500) answers 503 "payment service" at once and leaves nothing behind', async () => {
		const id = await sentQuote({
			clientEmail: CLIENT_SCHOOL,
			eventName: `Prize-giving ${Date.now()}`,
			date: '2034-05-02'
		});
		const client = await signIn(CLIENT_SCHOOL);
		await stripeFaults({ failNext: 10 });

		const refused = await accept(id, client, 10_000);
		expect(refused.status).toBe(503);
		expect(refused.json.message).toMatch(PAYMENT_SERVICE);
		expect(refused.ms).toBeLessThan(5000);

		// The quote page's form action says the same, as a failure the page shows.
		const { origin } = world();
		const viaPage = await timedFetch(
			`${origin}/quotes/${id}?/accept`,
			{
				method: 'POST',
				headers: {
					cookie: client,
					origin,
					accept: 'application/json',
					'x-sveltekit-action': 'true',
					'content-type': 'application/x-www-form-urlencoded'
				},
				body: 'acceptTerms=on' // the client ticks the terms, as the page asks
			},
			10_000
		);
		expect(viaPage.json).toMatchObject({ type: 'failure', status: 503 });
		expect(viaPage.json.data).toMatch(PAYMENT_SERVICE);

		await expectNothingHalfMade(id);
		expect(await finalizedOnStripe(id)).toBe(0);

		await stripeFaults({ failNext: 0 });
		const accepted = await accept(id, client, 10_000);
		expect(accepted.status, accepted.text).toBe(200);
		expect(accepted.json.quote.status).toBe('accepted');
		const after = await deskView(id);
		expect(after.invoices.map((i) => [i.kind, i.status])).toEqual([['deposit', 'open']]);
		expect(await finalizedOnStripe(id)).toBe(1);
		console.log(
			`[faults] stripe 500s: accept refused in ${refused.ms} ms (API), ${viaPage.ms} ms (page); after reset accepted in ${accepted.ms} ms`
		);
	});

	it('a service slower than the SDK timeout answers the same calm 503 within 20 s, nothing half-made', async () => {
		const id = await sentQuote({
			clientEmail: CLIENT_SCHOOL,
			eventName: `Founders' day ${Date.now()}`,
			date: '2034-05-09'
		});
		const client = await signIn(CLIENT_SCHOOL);
		await stripeFaults({ delayMs: 12_000 });

		const refused = await accept(id, client, 25_000);
		expect(refused.status).toBe(503);
		expect(refused.json.message).toMatch(PAYMENT_SERVICE);
		expect(refused.ms).toBeLessThan(20_000);
		await expectNothingHalfMade(id);

		await stripeFaults({ delayMs: 0 });
		const accepted = await accept(id, client, 10_000);
		expect(accepted.status, accepted.text).toBe(200);
		expect(accepted.json.quote.status).toBe('accepted');
		expect((await deskView(id)).invoices.map((i) => [i.kind, i.status])).toEqual([
			['deposit', 'open']
		]);
		// The slow calls that finished after the app gave up were replays of the same idempotent requests.
		expect(await finalizedOnStripe(id)).toBe(1);
		console.log(
			`[faults] stripe slow (12 s): accept refused in ${refused.ms} ms; after reset accepted in ${accepted.ms} ms`
		);
	});
});

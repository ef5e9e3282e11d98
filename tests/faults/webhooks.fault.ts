/**
 * Stripe's events over HTTP with the stand-in's real signatures, delivered the awkward ways Stripe
 * may deliver them: twice, late and out of order, before the app has recorded the invoice, forged.
 */
import { afterAll, describe, expect, it } from 'vitest';
import { CARD_DECLINED, CARD_SUCCEEDS, payOnHostedPage } from '../fakes/stripe/testing';
import { signatureHeader } from '../fakes/stripe/webhooks';
import { listMail } from '../fakes/mailbox';
import { api, eventually, signIn, timedFetch, within } from './http';
import { CLIENT_FESTIVAL, CLIENT_SCHOOL, deskView, sentQuote } from './quotes';
import { databaseSession, scalar, stripeFaults } from './services';
import { eventsForQuote, eventsOfType, resend } from './stripe-events';
import { world } from './world-info';

afterAll(async () => {
	await stripeFaults({ webhookUrl: world().env.STRIPE_WEBHOOK_URL });
});

const bookings = (id: number) => scalar('SELECT COUNT(*) FROM bookings WHERE quoteId = ?', [id]);

/** What the desk and the client can see of a paid quote; must not change under replays. */
async function snapshot(id: number, eventName: string, client: string) {
	const quote = await deskView(id);
	const inbox = await within(
		'the sink inbox',
		5000,
		listMail({ to: client, baseUrl: world().mailApi })
	);
	return {
		status: quote.status,
		invoices: quote.invoices.map((i) => `${i.kind}:${i.status}:${i.lastPaymentError ?? ''}`),
		outbox: quote.emails.map((e) => e.subject).sort(),
		delivered: inbox.filter((m) => m.subject.includes(eventName) || m.text.includes(eventName))
			.length,
		bookings: await bookings(id)
	};
}

async function confirmed(id: number, timeoutMs: number) {
	return eventually(
		`quote ${id} confirmed`,
		async () => ((await deskView(id)).status === 'confirmed' ? true : undefined),
		timeoutMs
	);
}

describe('webhooks delivered twice, late and out of order', () => {
	it('a replayed invoice.paid and a late invoice.payment_failed change nothing', async () => {
		const eventName = `Lantern parade ${Date.now()}`;
		const id = await sentQuote({ clientEmail: CLIENT_FESTIVAL, eventName, date: '2034-06-13' });
		const client = await signIn(CLIENT_FESTIVAL);
		const accepted = await api(`/api/quotes/${id}/actions`, {
			cookie: client,
			method: 'POST',
			body: { action: 'accept', acceptTerms: true },
			timeoutMs: 10_000
		});
		expect(accepted.status, accepted.text).toBe(200);
		const hostedUrl = (await deskView(id)).invoices[0].hostedUrl!;

		// A declined card whose event is held back (recorded, not delivered) so it can arrive late.
		await stripeFaults({ webhookUrl: '' });
		expect(
			(await within('declined payment', 10_000, payOnHostedPage(hostedUrl, CARD_DECLINED))).status
		).toBe(402);
		const failed = await eventually(
			'the payment_failed event',
			async () => (await eventsForQuote('invoice.payment_failed', id))[0],
			5000
		);
		expect(failed.delivery.status).toBe('disabled');
		await stripeFaults({ webhookUrl: world().env.STRIPE_WEBHOOK_URL });

		const paidStarted = performance.now();
		expect(
			(await within('card payment', 10_000, payOnHostedPage(hostedUrl, CARD_SUCCEEDS))).status
		).toBe(303);
		await confirmed(id, 10_000);
		const confirmedMs = Math.round(performance.now() - paidStarted);
		await new Promise((r) => setTimeout(r, 1500)); // let the confirmation e-mails land
		const before = await snapshot(id, eventName, CLIENT_FESTIVAL);
		expect(before).toMatchObject({ status: 'confirmed', invoices: ['deposit:paid:'], bookings: 1 });
		expect(before.outbox.filter((s) => /^Booking confirmed/.test(s))).toHaveLength(1);
		expect(before.outbox.filter((s) => /^Payment received/.test(s))).toHaveLength(1);

		const [paid] = await eventsForQuote('invoice.paid', id);
		expect(paid.delivery.status).toBe('delivered');
		expect(await resend(paid.id)).toBe(200);
		expect(await resend(paid.id)).toBe(200);
		expect(await resend(failed.id)).toBe(200); // first delivery, after the payment: out of order
		await new Promise((r) => setTimeout(r, 1500)); // any stray e-mail would have left by now
		expect(await snapshot(id, eventName, CLIENT_FESTIVAL)).toEqual(before);
		expect(
			await scalar('SELECT COUNT(*) FROM webhook_events WHERE id = ? AND outcome LIKE ?', [
				failed.id,
				'payment failure ignored%'
			])
		).toBe(1);
		console.log(
			`[faults] webhooks: confirmed ${confirmedMs} ms after payment; 2 replays of invoice.paid + a late payment_failed changed nothing`
		);
	});

	it('an event for an invoice not yet recorded answers 503, and Stripe’s retry applies it later', async () => {
		const eventName = `Sports day ${Date.now()}`;
		const id = await sentQuote({ clientEmail: CLIENT_SCHOOL, eventName, date: '2034-06-20' });
		const client = await signIn(CLIENT_SCHOOL);

		// Hold the quote's row lock so the accept stalls after Stripe finalized the invoice but
		// before our database records it: the window in which Stripe's event can outrun our write.
		const lock = await databaseSession();
		let acceptMs = 0;
		try {
			await lock.beginTransaction();
			await lock.query('SELECT id FROM quotes WHERE id = ? FOR UPDATE', [id]);
			const accepting = api(`/api/quotes/${id}/actions`, {
				cookie: client,
				method: 'POST',
				body: { action: 'accept', acceptTerms: true },
				timeoutMs: 40_000
			});
			accepting.catch(() => undefined); // awaited below; keep an early failure from going unhandled

			const finalized = await eventually(
				'the finalized invoice',
				async () => (await eventsForQuote('invoice.finalized', id))[0],
				10_000
			);
			const hostedUrl = finalized.data.object.hosted_invoice_url!;
			expect(
				(await within('card payment', 10_000, payOnHostedPage(hostedUrl, CARD_SUCCEEDS))).status
			).toBe(303);
			const early = await eventually(
				'the first delivery of invoice.paid',
				async () =>
					(await eventsForQuote('invoice.paid', id)).find((e) => e.delivery.attempts.length > 0),
				10_000,
				50
			);
			expect(early.delivery.attempts[0].status).toBe(503);
			expect((await deskView(id)).invoices).toEqual([]);

			await lock.rollback(); // our write may now go ahead
			const accepted = await accepting;
			acceptMs = accepted.ms;
			expect(accepted.status, accepted.text).toBe(200);
		} finally {
			await lock.end();
		}

		// Stripe's retries come 1 s, 3 s and 9 s after the first attempt.
		const paid = await eventually(
			'invoice.paid delivered by a retry',
			async () =>
				(await eventsForQuote('invoice.paid', id)).find((e) => e.delivery.status !== 'pending'),
			20_000
		);
		expect((await deskView(id)).status).toBe('confirmed');
		const statuses = paid.delivery.attempts.map((a) => a.status);
		expect(statuses[0]).toBe(503);
		expect(statuses.at(-1)).toBe(200);
		expect(paid.delivery.status).toBe('delivered');
		expect(await bookings(id)).toBe(1);
		console.log(
			`[faults] webhooks: invoice.paid before our write answered ${statuses.join(' → ')}; accept waited ${acceptMs} ms on the held lock`
		);
	});

	it('a forged, tampered or stale signature is refused with 400 and changes nothing', async () => {
		const { origin, env } = world();
		const [paid] = await eventsOfType('invoice.paid');
		expect(paid, 'an earlier test paid an invoice').toBeDefined();
		const id = Number(paid.data.object.metadata?.quoteId);
		const before = await deskView(id);
		const body = JSON.stringify({ ...paid, id: `evt_forged_${Date.now()}`, delivery: undefined });
		const post = (signature: string, payload = body) =>
			timedFetch(`${origin}/api/webhooks/stripe`, {
				method: 'POST',
				headers: { 'content-type': 'application/json', 'stripe-signature': signature },
				body: payload
			});

		const forged = await post(signatureHeader(body, 'whsec_not_the_real_secret'));
		expect(forged.status).toBe(400);
		expect(forged.json.message).toMatch(/signature/i);
		const tampered = await post(
			signatureHeader(body, env.STRIPE_WEBHOOK_SECRET),
			body.replace('"invoice.paid"', '"invoice.voided"')
		);
		expect(tampered.status).toBe(400);
		const stale = await post(
			signatureHeader(body, env.STRIPE_WEBHOOK_SECRET, Math.floor(Date.now() / 1000) - 3600)
		);
		expect(stale.status).toBe(400);
		const after = await deskView(id);
		expect([after.status, after.invoices, after.emails.map((e) => e.id)]).toEqual([
			before.status,
			before.invoices,
			before.emails.map((e) => e.id)
		]);
	});
});

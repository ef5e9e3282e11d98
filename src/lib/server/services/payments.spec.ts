/**
 * The money path against the Stripe stand-in: accept → deposit invoice → pay → signed event →
 * confirmed booking, plus the ways it can go wrong. Events are fetched from the stand-in and
 * applied directly (the web route that verifies signatures is covered by the browser tests).
 */
import { describe, expect, it, vi } from 'vitest';
import { useTestDatabase } from '../../../../tests/helpers/db';
import { makeContactUser, makeStaffUser, makeStockedPackage } from '../../../../tests/helpers/inventory';
import { eventFor, fakeConfig } from '../../../../tests/helpers/stripe-fake';
import { CARD_DECLINED, CARD_SUCCEEDS, payOnHostedPage } from '../../../../tests/fakes/stripe/testing';
import { Booking, BookingLine, Invoice, Quote } from '../db/models';
import { stripe } from '../payments/stripe-client';
import { applyStripeEvent } from './payment-events';
import { applyQuoteAction } from './quote-actions';
import { createQuote, getQuote } from './quotes';

useTestDatabase();

const request = {
	targetDb: 90, weighting: 'A' as const, distance: 10, distanceUnit: 'm' as const, programme: 'speech',
	temperatureC: 20, humidityPct: 50, startDate: '2033-09-10', endDate: '2033-09-11'
};

async function sentQuote(units = 2) {
	const stock = await makeStockedPackage({ cabinets: 2, units });
	const desk = await makeStaffUser();
	const { client, user } = await makeContactUser();
	const quote = await createQuote({ clientId: client.id, eventName: 'Money path', packageId: stock.pkg.id, request }, desk);
	await applyQuoteAction(quote.id, 'send', desk);
	return { quote, desk, client: user, stock };
}

async function acceptAndPay(quoteId: number, client: Parameters<typeof applyQuoteAction>[2], card = CARD_SUCCEEDS) {
	const { quote } = await applyQuoteAction(quoteId, { action: 'accept', acceptTerms: true }, client);
	const deposit = quote.invoices.find((i) => i.kind === 'deposit')!;
	const stripeId = (await Invoice.findByPk(deposit.id))!.stripeInvoiceId;
	const paid = await payOnHostedPage(deposit.hostedUrl!, card);
	return { deposit, stripeId, paid };
}

describe('deposit and booking', () => {
	it('accept → invoice → pay → event → deposit paid, booked, stock reserved; a replay changes nothing', async () => {
		const { quote, client, stock } = await sentQuote();
		const { deposit, stripeId } = await acceptAndPay(quote.id, client);
		expect(deposit.amountMinor).toBe(quote.result.price.depositMinor);
		expect(Number.isInteger(deposit.taxMinor)).toBe(true);
		expect(deposit.status).toBe('open');

		const event = await eventFor('invoice.paid', stripeId);
		expect(await applyStripeEvent(event)).toEqual({ status: 200, outcome: 'deposit paid; booking confirmed' });
		const after = await getQuote(quote.id, client);
		expect(after.status).toBe('confirmed');
		expect(after.invoices[0].status).toBe('paid');
		const booking = await Booking.findOne({ where: { quoteId: quote.id } });
		const lines = await BookingLine.findAll({ where: { bookingId: booking!.id } });
		expect(lines.find((l) => l.modelType === 'loudspeaker')).toMatchObject({ modelId: stock.loudspeaker.id, quantity: 2 });

		expect(await applyStripeEvent(event)).toEqual({ status: 200, outcome: 'already applied' });
		expect(await BookingLine.count({ where: { bookingId: booking!.id } })).toBe(lines.length);
	});

	it('a declined card leaves the invoice open with a message, and the quote waiting', async () => {
		const { quote, client } = await sentQuote();
		const { stripeId, paid } = await acceptAndPay(quote.id, client, CARD_DECLINED);
		expect(paid.status).toBe(402);
		await applyStripeEvent(await eventFor('invoice.payment_failed', stripeId));
		const after = await getQuote(quote.id, client);
		expect(after.status).toBe('accepted');
		expect(after.invoices[0]).toMatchObject({ status: 'open', lastPaymentError: expect.stringMatching(/declined/) });
	});

	it('an event about an invoice we have not recorded yet asks to be retried (503), applying nothing', async () => {
		const { quote, client } = await sentQuote();
		const { stripeId } = await acceptAndPay(quote.id, client);
		const event = await eventFor('invoice.paid', stripeId);
		const early = { ...event, id: `${event.id}_early`, data: { object: { ...event.data.object, id: 'in_not_ours_yet' } } } as typeof event;
		expect((await applyStripeEvent(early)).status).toBe(503);
		expect((await getQuote(quote.id, client)).status).toBe('accepted');
	});

	it('with the payment service down, accepting fails with a clear 503 and leaves nothing half-made', async () => {
		const { quote, client } = await sentQuote();
		await fakeConfig({ failNext: 6 });
		try {
			await expect(applyQuoteAction(quote.id, { action: 'accept', acceptTerms: true }, client)).rejects.toMatchObject({ status: 503, message: expect.stringMatching(/not answering/) });
		} finally {
			await fakeConfig({ failNext: 0 });
		}
		expect((await getQuote(quote.id, client)).status).toBe('sent');
		expect(await Invoice.count({ where: { quoteId: quote.id } })).toBe(0);
		// And it works once the service is back; the retry reuses the same idempotency keys.
		expect((await applyQuoteAction(quote.id, { action: 'accept', acceptTerms: true }, client)).quote.status).toBe('accepted');
	});

	it('cancelling a confirmed hire long before it starts refunds the deposit and frees the stock', async () => {
		const { quote, client, desk } = await sentQuote();
		const { stripeId } = await acceptAndPay(quote.id, client);
		await applyStripeEvent(await eventFor('invoice.paid', stripeId));
		const { quote: cancelled } = await applyQuoteAction(quote.id, 'cancel', desk);
		expect(cancelled.status).toBe('cancelled');
		expect(cancelled.invoices[0].refundedMinor).toBe(cancelled.invoices[0].amountMinor);
		expect((await Booking.findOne({ where: { quoteId: quote.id } }))!.status).toBe('cancelled');
	});
});

describe('racing for the last units', () => {
	it('20 paid deposits competing for 5 units: exactly 5 bookings, the rest flagged with their payment kept', async () => {
		const { pkg, loudspeaker } = await makeStockedPackage({ cabinets: 1, units: 5, amplifierUnits: 20 });
		const desk = await makeStaffUser();
		const { client } = await makeContactUser();
		const quotes = [];
		for (let i = 0; i < 20; i++) {
			quotes.push(await createQuote({ clientId: client.id, eventName: `Race ${i}`, packageId: pkg.id, request: { ...request, startDate: '2034-01-05', endDate: '2034-01-05' } }, desk));
		}
		// Each quote accepted with a paid deposit invoice on record, as the webhook would find it.
		const events = [];
		for (const q of quotes) {
			await Quote.update({ status: 'accepted' }, { where: { id: q.id } });
			const invoice = await Invoice.create({ quoteId: q.id, kind: 'deposit', stripeInvoiceId: `in_race_${q.id}`, number: null, status: 'open', amountMinor: 100, taxMinor: 0, currency: 'GBP', hostedUrl: null });
			events.push({ id: `evt_race_${q.id}`, object: 'event', type: 'invoice.paid', data: { object: { id: invoice.stripeInvoiceId, object: 'invoice' } } });
		}
		// These invoices exist only in our database: the payment service is asked to confirm each as paid.
		const retrieve = vi.spyOn(stripe().invoices, 'retrieve').mockImplementation((async (id: string) => ({ id, status: 'paid', amount_paid: 100, currency: 'gbp' })) as never);
		const outcomes = await Promise.all(events.map((e) => applyStripeEvent(e as never))).finally(() => retrieve.mockRestore());
		expect(outcomes.every((o) => o.status === 200)).toBe(true);
		const confirmed = await Quote.count({ where: { id: quotes.map((q) => q.id), status: 'confirmed' } });
		const flagged = await Quote.count({ where: { id: quotes.map((q) => q.id), status: 'deposit-paid' } });
		expect(confirmed).toBe(5);
		expect(flagged).toBe(15);
		const reserved = (await BookingLine.sum('quantity', { where: { modelType: 'loudspeaker', modelId: loudspeaker.id } })) ?? 0;
		expect(reserved).toBe(5);
		expect(await Invoice.count({ where: { quoteId: quotes.map((q) => q.id), status: 'paid' } })).toBe(20);
	}, 90_000);
});

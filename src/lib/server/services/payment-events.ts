/**
 * What a Stripe event does to our records. Each event is applied once: its id is written in the
 * same transaction as its effect, so a replay finds the id and changes nothing. An event about an
 * invoice we have not recorded yet (it can outrun our own write) is answered "retry later".
 */
import type Stripe from 'stripe';
import { UniqueConstraintError, type Transaction } from 'sequelize';
import { nextStatus } from '$lib/quotes/states';
import { Client, Invoice, OutboundEmail, Quote, QuoteVersion, WebhookEvent } from '../db';
import { deliver, queueEmail, type EmailMessage } from '../mail/outbox';
import { bookingConfirmedEmail, bookingHeldUpEmail, receiptEmail } from '../mail/payment-emails';
import { reservationTransaction, reserveStockForQuote } from './bookings';
import { quoteReference } from '$lib/quotes/reference';
import { getSettings, type Settings } from './settings';
import { noteForDesk } from './desk-notices';
import { isPaymentServiceDown, stripe } from '../payments/stripe-client';
import { paidOutOfTurnIssue, stockShortIssue } from '$lib/bookings/issue-text';

export type EventOutcome = { status: 200 | 503; outcome: string };

class RetryLater extends Error {}

/**
 * "Paid" is believed only from the payment service itself: the invoice is fetched through the SDK
 * (before our transaction, which must not wait on the network) and its status and amount checked.
 */
async function confirmedInvoice(event: Stripe.Event): Promise<Stripe.Invoice | null> {
	if (event.type !== 'invoice.paid') return null;
	const id = (event.data.object as Stripe.Invoice).id;
	if (!id) return null;
	try {
		return await stripe().invoices.retrieve(id);
	} catch (err) {
		if (isPaymentServiceDown(err)) throw new RetryLater('payment service not answering; retry later');
		if ((err as { code?: string }).code === 'resource_missing') return null; // unknown there: never paid
		throw err;
	}
}

export async function applyStripeEvent(event: Stripe.Event): Promise<EventOutcome> {
	let emailIds: number[] = [];
	try {
		// Read before the transaction: a query outside it while every pooled connection is held by
		// transactions queued on the same row locks would wait for a connection that never frees.
		const settings = await getSettings();
		const company = settings.companyName;
		const confirmed = await confirmedInvoice(event);
		const outcome = await reservationTransaction(async (transaction) => {
			await WebhookEvent.create({ id: event.id, type: event.type, outcome: 'applying' }, { transaction });
			const result = await route(event, { t: transaction, company, settings, confirmed });
			emailIds = result.emailIds;
			await WebhookEvent.update({ outcome: result.outcome }, { where: { id: event.id }, transaction });
			return result.outcome;
		});
		for (const id of emailIds) await deliver((await OutboundEmail.findByPk(id))!);
		return { status: 200, outcome };
	} catch (err) {
		if (err instanceof UniqueConstraintError && (await WebhookEvent.findByPk(event.id))) {
			return { status: 200, outcome: 'already applied' };
		}
		if (err instanceof RetryLater) return { status: 503, outcome: err.message };
		throw err;
	}
}

type Applied = { outcome: string; emailIds: number[] };

interface Ctx {
	t: Transaction;
	company: string;
	settings: Settings;
	/** For invoice.paid: the invoice as the payment service has it now. */
	confirmed: Stripe.Invoice | null;
}

async function route(event: Stripe.Event, ctx: Ctx): Promise<Applied> {
	switch (event.type) {
		case 'invoice.paid':
			return invoicePaid(event.data.object as Stripe.Invoice, ctx);
		case 'invoice.payment_failed':
			return invoicePaymentFailed(event.data.object as Stripe.Invoice, ctx.t);
		case 'invoice.voided':
			return invoiceVoided(event.data.object as Stripe.Invoice, ctx.t);
		case 'charge.refunded':
			return chargeRefunded(event.data.object as Stripe.Charge, ctx.t);
		default:
			return { outcome: `ignored ${event.type}`, emailIds: [] };
	}
}

async function ourInvoice(stripeInvoiceId: string | undefined, t: Transaction): Promise<Invoice> {
	const invoice = stripeInvoiceId
		? await Invoice.findOne({ where: { stripeInvoiceId }, transaction: t, lock: t.LOCK.UPDATE })
		: null;
	if (!invoice) throw new RetryLater(`invoice ${stripeInvoiceId} not recorded yet`);
	return invoice;
}

async function emailTo(quote: Quote, build: (to: string, q: Parameters<typeof receiptEmail>[1], company: string) => EmailMessage, { t, company }: Ctx) {
	const [client, version] = await Promise.all([
		Client.findByPk(quote.clientId, { transaction: t }),
		QuoteVersion.findOne({ where: { quoteId: quote.id, version: quote.currentVersion }, transaction: t })
	]);
	const ref = { id: quote.id, reference: quoteReference(quote.id), eventName: quote.eventName, startDate: version!.startDate, endDate: version!.endDate };
	return (await queueEmail(build(client!.email, ref, company), t)).id;
}

/** Why a "paid" event must change nothing, or null when the payment service confirms it. */
function paidRefusal(invoice: Invoice, confirmed: Stripe.Invoice | null): string | null {
	if (invoice.status === 'void') return 'paid ignored: we voided this invoice';
	if (!confirmed || confirmed.status !== 'paid') return `paid ignored: the payment service has it ${confirmed?.status ?? 'unknown'}`;
	if (confirmed.amount_paid !== invoice.amountMinor || confirmed.currency?.toLowerCase() !== invoice.currency.toLowerCase()) {
		return `paid ignored: the payment service shows ${confirmed.amount_paid} ${confirmed.currency}, we invoiced ${invoice.amountMinor} ${invoice.currency}`;
	}
	return null;
}

async function invoicePaid(object: Stripe.Invoice, ctx: Ctx): Promise<Applied> {
	const { t } = ctx;
	const invoice = await ourInvoice(object.id, t);
	if (invoice.status === 'paid') return { outcome: 'invoice already paid', emailIds: [] };
	const refusal = paidRefusal(invoice, ctx.confirmed);
	if (refusal) {
		console.warn(`[webhook] ${refusal} (invoice ${invoice.id}, ${object.id})`);
		return { outcome: refusal, emailIds: [] };
	}
	const legacy = ctx.confirmed as Stripe.Invoice & { payment_intent?: string | null };
	await invoice.update({ status: 'paid', paidAt: new Date(), paymentIntentId: legacy.payment_intent ?? null, lastPaymentError: null }, { transaction: t });
	const quote = (await Quote.findByPk(invoice.quoteId, { transaction: t, lock: t.LOCK.UPDATE }))!;
	const emailIds = [await emailTo(quote, (to, q, c) => receiptEmail(to, q, invoice.amountMinor, invoice.currency, c), ctx)];
	if (invoice.kind !== 'deposit') return { outcome: 'balance paid', emailIds };
	// The desk hears of every paid deposit, whatever becomes of the booking.
	const notice = await noteForDesk(quote, 'paid', null, ctx.settings, t);
	if (notice) emailIds.push(notice);

	if (!nextStatus(quote.status, 'pay-deposit')) {
		// Paid for a quote no longer waiting for it (e.g. cancelled meanwhile): keep the money visible to the desk.
		await quote.update({ bookingIssue: paidOutOfTurnIssue(quote.status) }, { transaction: t });
		return { outcome: `deposit paid on a ${quote.status} quote; flagged`, emailIds };
	}
	await quote.update({ status: 'deposit-paid' }, { transaction: t });
	const reservation = await reserveStockForQuote(quote.id, quote.currentVersion, t);
	if (!reservation.ok) {
		await quote.update({ bookingIssue: stockShortIssue(reservation.shortfalls) }, { transaction: t });
		emailIds.push(await emailTo(quote, bookingHeldUpEmail, ctx));
		return { outcome: 'deposit paid; stock short, flagged for the desk', emailIds };
	}
	await quote.update({ status: 'confirmed', bookingIssue: null }, { transaction: t });
	emailIds.push(await emailTo(quote, bookingConfirmedEmail, ctx));
	return { outcome: 'deposit paid; booking confirmed', emailIds };
}

async function invoicePaymentFailed(object: Stripe.Invoice, t: Transaction): Promise<Applied> {
	const invoice = await ourInvoice(object.id, t);
	if (invoice.status !== 'open') return { outcome: `payment failure ignored on a ${invoice.status} invoice`, emailIds: [] };
	await invoice.update({ lastPaymentError: 'The card was declined. The client can try another card on the same page.' }, { transaction: t });
	return { outcome: 'payment failed; invoice still open', emailIds: [] };
}

async function invoiceVoided(object: Stripe.Invoice, t: Transaction): Promise<Applied> {
	const invoice = await ourInvoice(object.id, t);
	if (invoice.status === 'paid') return { outcome: 'void ignored on a paid invoice', emailIds: [] };
	await invoice.update({ status: 'void' }, { transaction: t });
	return { outcome: 'invoice void', emailIds: [] };
}

async function chargeRefunded(object: Stripe.Charge, t: Transaction): Promise<Applied> {
	const intent = typeof object.payment_intent === 'string' ? object.payment_intent : object.payment_intent?.id;
	const invoice = intent ? await Invoice.findOne({ where: { paymentIntentId: intent }, transaction: t, lock: t.LOCK.UPDATE }) : null;
	if (!invoice) return { outcome: 'refund for an unknown payment ignored', emailIds: [] };
	await invoice.update({ refundedMinor: Math.max(invoice.refundedMinor, object.amount_refunded) }, { transaction: t });
	return { outcome: `refund recorded (${object.amount_refunded})`, emailIds: [] };
}

/**
 * Deposit and balance invoices through the Stripe SDK. Stripe is called first, with idempotency keys
 * derived from the quote, so a retry after a timeout returns the same objects; our database changes
 * only once Stripe has answered. A payment service that is down leaves nothing half-made.
 */
import type { Transaction } from 'sequelize';
import { balanceAmounts, depositAmounts, type InvoiceAmounts } from '$lib/quotes/invoice-split';
import { Client, Invoice } from '../db';
import { isPaymentServiceDown, stripe } from '../payments/stripe-client';
import { DomainError } from './errors';
import { quoteReference } from '$lib/quotes/reference';
import { chargeTooLarge } from '$lib/quotes/hire-limits';
import type { QuoteDetail } from '$lib/quotes/types';
import { getSettings } from './settings';

export const PAYMENT_SERVICE_DOWN =
	'The payment service is not answering. Nothing was charged or changed; please try again in a minute.';

/** Runs Stripe calls, turning an outage into a calm 503 and a refusal into a 409. */
export async function viaStripe<T>(work: () => Promise<T>): Promise<T> {
	try {
		return await work();
	} catch (err) {
		if (isPaymentServiceDown(err)) throw new DomainError(503, PAYMENT_SERVICE_DOWN);
		if ((err as { type?: string }).type?.startsWith('Stripe')) {
			throw new DomainError(409, `The payment service refused: ${(err as Error).message}`);
		}
		throw err;
	}
}

async function customerFor(clientId: number): Promise<string> {
	const client = (await Client.findByPk(clientId))!;
	if (client.stripeCustomerId) return client.stripeCustomerId;
	const customer = await stripe().customers.create(
		{ name: client.name, email: client.email, metadata: { clientId: String(client.id) } },
		// The creation time keeps keys unique if the database is ever rebuilt against the same account.
		{ idempotencyKey: `throwline-client-${client.id}-${client.createdAt.getTime()}-customer` }
	);
	await client.update({ stripeCustomerId: customer.id });
	return customer.id;
}

export interface IssuedInvoice {
	stripeInvoiceId: string;
	number: string | null;
	hostedUrl: string | null;
	amounts: InvoiceAmounts;
	currency: string;
}

/** Creates, fills and finalizes a Stripe invoice for part of a quote; saves nothing locally. */
export async function issueStripeInvoice(quote: QuoteDetail, kind: 'deposit' | 'balance'): Promise<IssuedInvoice> {
	const price = quote.result.price;
	const amounts = kind === 'deposit' ? depositAmounts(price) : balanceAmounts(price);
	if (chargeTooLarge(amounts.amountMinor)) {
		throw new DomainError(422, 'This invoice is more than the payment service can take at once; split the hire into several quotes.');
	}
	const settings = await getSettings();
	const key = `throwline-quote-${quote.id}-${Date.parse(quote.versions.at(-1)!.createdAt)}-v${quote.version}-${kind}`;
	const currency = price.currency.toLowerCase();
	return viaStripe(async () => {
		const customer = await customerFor(quote.clientId);
		const label = `${kind === 'deposit' ? `Deposit (${price.depositBp / 100} %)` : 'Balance'} for ${quoteReference(quote.id)} ${quote.eventName}, ${quote.startDate} to ${quote.endDate}`;
		const draft = await stripe().invoices.create(
			{
				customer,
				collection_method: 'send_invoice',
				days_until_due: settings.paymentTermsDays,
				currency,
				description: label,
				metadata: { quoteId: String(quote.id), kind, version: String(quote.version) }
			},
			{ idempotencyKey: `${key}-invoice` }
		);
		const lines = [
			{ amount: amounts.amountMinor - amounts.taxMinor, description: `${label} (before tax)`, suffix: 'net' },
			{ amount: amounts.taxMinor, description: `Tax at ${price.taxRateBp / 100} %`, suffix: 'tax' }
		];
		for (const line of lines) {
			await stripe().invoiceItems.create(
				{ customer, invoice: draft.id!, amount: line.amount, currency, description: line.description },
				{ idempotencyKey: `${key}-item-${line.suffix}` }
			);
		}
		const open = await stripe().invoices.finalizeInvoice(draft.id!, {}, { idempotencyKey: `${key}-finalize` });
		return { stripeInvoiceId: open.id!, number: open.number ?? null, hostedUrl: open.hosted_invoice_url ?? null, amounts, currency: price.currency };
	});
}

export async function saveIssuedInvoice(quoteId: number, kind: 'deposit' | 'balance', issued: IssuedInvoice, transaction: Transaction): Promise<Invoice> {
	const existing = await Invoice.findOne({ where: { stripeInvoiceId: issued.stripeInvoiceId }, transaction });
	if (existing) return existing;
	return Invoice.create(
		{
			quoteId,
			kind,
			stripeInvoiceId: issued.stripeInvoiceId,
			number: issued.number,
			status: 'open',
			amountMinor: issued.amounts.amountMinor,
			taxMinor: issued.amounts.taxMinor,
			currency: issued.currency,
			hostedUrl: issued.hostedUrl
		},
		{ transaction }
	);
}

/** Best effort: void an invoice our database never recorded (a lost race), so it cannot be paid. */
export async function voidOrphanInvoice(stripeInvoiceId: string): Promise<void> {
	if (await Invoice.findOne({ where: { stripeInvoiceId } })) return;
	await stripe().invoices.voidInvoice(stripeInvoiceId).catch(() => undefined);
}


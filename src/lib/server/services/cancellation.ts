/** The money side of cancelling a quote: void what is unpaid, refund the deposit per the company's rule. */
import { depositRefundMinor } from '$lib/quotes/invoice-split';
import { Invoice } from '../db';
import { cancellationEmail } from '../mail/payment-emails';
import { stripe } from '../payments/stripe-client';
import { viaStripe } from './invoices';
import type { QuoteDetail } from '$lib/quotes/types';
import { getSettings } from './settings';

export async function cancelMoney(quote: QuoteDetail) {
	const settings = await getSettings();
	const invoices = await Invoice.findAll({ where: { quoteId: quote.id } });
	let refundMinor = 0;
	await viaStripe(async () => {
		for (const invoice of invoices) {
			if (invoice.status === 'open') {
				await stripe().invoices.voidInvoice(invoice.stripeInvoiceId, {}, { idempotencyKey: `throwline-void-${invoice.stripeInvoiceId}` });
				await invoice.update({ status: 'void' });
			} else if (invoice.status === 'paid' && invoice.kind === 'deposit' && invoice.paymentIntentId) {
				const due = depositRefundMinor(invoice.amountMinor - invoice.refundedMinor, new Date().toISOString().slice(0, 10), quote.startDate, settings.cancellationFullRefundDays);
				if (due > 0) {
					await stripe().refunds.create({ payment_intent: invoice.paymentIntentId, amount: due }, { idempotencyKey: `throwline-refund-${invoice.stripeInvoiceId}` });
					await invoice.update({ refundedMinor: invoice.refundedMinor + due });
					refundMinor += due;
				}
			}
		}
	});
	const currency = quote.currency;
	return { refundMinor, email: (to: string, company: string) => cancellationEmail(to, quote, refundMinor, currency, company) };
}

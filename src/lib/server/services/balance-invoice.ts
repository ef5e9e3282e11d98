/** The second invoice of a hire: the balance, once the booking is confirmed. */
import { db, Client, Invoice, OutboundEmail, Quote } from '../db';
import { deliver, queueEmail } from '../mail/outbox';
import { invoiceEmail } from '../mail/payment-emails';
import type { SessionUser } from '../auth/signed-in-user';
import { DomainError } from './errors';
import { issueStripeInvoice, saveIssuedInvoice, voidOrphanInvoice } from './invoices';
import type { QuoteDetail } from '$lib/quotes/types';
import { getQuote } from './quotes';
import { getSettings } from './settings';

/**
 * Idempotent: the payment service returns the same invoice for the same quote version (idempotency
 * keys), and only the request that records it sends the e-mail. Concurrent requests queue on the
 * quote's row lock; the others answer `created: false` with the same invoice and send nothing.
 */
export async function createBalanceInvoice(id: number, actor: SessionUser): Promise<{ quote: QuoteDetail; mailSent: boolean; created: boolean }> {
	const quote = await getQuote(id, actor);
	if (quote.status !== 'confirmed') throw new DomainError(409, 'The balance is invoiced once the booking is confirmed.');
	if (quote.invoices.some((i) => i.kind === 'balance' && i.status !== 'void')) {
		throw new DomainError(409, 'The balance has already been invoiced.');
	}
	if (quote.result.price.balanceMinor <= 0) throw new DomainError(409, 'Nothing is left to invoice.');
	const issued = await issueStripeInvoice(quote, 'balance');
	const company = (await getSettings()).companyName; // read before the transaction, see quote-actions
	let emailId: number | null;
	try {
		emailId = await db().transaction(async (transaction) => {
			// One request at a time per quote; a lock on the (absent) invoice rows would only gap-lock and deadlock.
			await Quote.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE, attributes: ['id'] });
			const again = await Invoice.findOne({ where: { quoteId: id, kind: 'balance', status: ['open', 'paid'] }, transaction });
			if (again && again.stripeInvoiceId !== issued.stripeInvoiceId) throw new DomainError(409, 'The balance has already been invoiced.');
			if (again) return null; // recorded and e-mailed by the request that came first
			await saveIssuedInvoice(id, 'balance', issued, transaction);
			const client = (await Client.findByPk(quote.clientId, { transaction }))!;
			const mail = invoiceEmail(client.email, quote, 'balance', issued.amounts.amountMinor, issued.currency, issued.hostedUrl, company);
			return (await queueEmail(mail, transaction)).id;
		});
	} catch (err) {
		await voidOrphanInvoice(issued.stripeInvoiceId);
		throw err;
	}
	if (emailId === null) return { quote: await getQuote(id, actor), mailSent: false, created: false };
	const mailSent = await deliver((await OutboundEmail.findByPk(emailId))!);
	return { quote: await getQuote(id, actor), mailSent, created: true };
}

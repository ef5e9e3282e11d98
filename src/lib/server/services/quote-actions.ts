/** Moving a quote through its states: one row lock per move, illegal moves refused with 409. */
import { nextStatus, type QuoteAction, type QuoteStatus } from '$lib/quotes/states';
import { db, Client, OutboundEmail, Quote } from '../db';
import { deliver, queueEmail } from '../mail/outbox';
import { invoiceEmail } from '../mail/payment-emails';
import { quoteSentEmail } from '../mail/quote-emails';
import { clientAccountFor, createSignInLink } from '../auth/sign-in-links';
import type { SessionUser } from '../users';
import { cancelMoney } from './cancellation';
import { DomainError } from './errors';
import { issueStripeInvoice, saveIssuedInvoice, voidOrphanInvoice, type IssuedInvoice } from './invoices';
import { getQuote, type QuoteDetail } from './quotes';
import { releaseBooking } from './bookings';
import { getSettings } from './settings';

// Deposit and confirmation follow a paid invoice; nobody moves a quote there by hand.
const STAFF_ACTIONS: readonly QuoteAction[] = ['send', 'accept', 'cancel', 'close'];
const CLIENT_ACTIONS: readonly QuoteAction[] = ['accept'];

const TIMESTAMPS: Partial<Record<QuoteStatus, 'sentAt' | 'acceptedAt' | 'cancelledAt'>> = {
	sent: 'sentAt',
	accepted: 'acceptedAt',
	cancelled: 'cancelledAt'
};

export interface ActionOutcome {
	quote: QuoteDetail;
	/** Whether the e-mail this action sends left now (false = queued for retry; the action still stands). */
	mailSent?: boolean;
}

export async function applyQuoteAction(id: number, action: QuoteAction, actor: SessionUser): Promise<ActionOutcome> {
	const allowed = actor.role === 'client' ? CLIENT_ACTIONS : STAFF_ACTIONS;
	if (!allowed.includes(action)) throw new DomainError(403, 'Your role cannot do that to a quote.');
	const before = await getQuote(id, actor); // 404 for a quote the actor may not see
	if (!nextStatus(before.status, action)) {
		throw new DomainError(409, `A quote that is ${before.status} cannot be given “${action}”.`);
	}

	// Money first, outside our transaction: if the payment service is down nothing below happens.
	const deposit = action === 'accept' ? await issueStripeInvoice(before, 'deposit') : null;
	const refund = action === 'cancel' ? await cancelMoney(before) : null;

	// Outside the transaction, so it never waits for a second pooled connection while holding locks.
	const company = (await getSettings()).companyName;
	let emailId: number | null = null;
	try {
		emailId = await db().transaction(async (transaction) => {
			const quote = await Quote.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
			const next = quote && nextStatus(quote.status, action);
			if (!quote || !next) throw new DomainError(409, 'The quote changed meanwhile; reload and try again.');
			if (action === 'send' && quote.needsRecheck) {
				throw new DomainError(409, 'A specification this quote relies on has changed. Revise the quote before sending it.');
			}
			const stamp = TIMESTAMPS[next];
			await quote.update({ status: next, ...(stamp ? { [stamp]: new Date() } : {}) }, { transaction });
			const client = (await Client.findByPk(quote.clientId, { transaction }))!;
			if (action === 'cancel') await releaseBooking(id, transaction);
			if (action === 'send') {
				const account = await clientAccountFor(client, transaction);
				const token = await createSignInLink(account.id, `/quotes/${id}`, transaction);
				return (await queueEmail(quoteSentEmail({ ...before, status: next }, client.email, company, token), transaction)).id;
			}
			if (deposit) {
				await saveIssuedInvoice(id, 'deposit', deposit, transaction);
				return (await queueEmail(depositMail(client.email, before, deposit, company), transaction)).id;
			}
			if (refund) return (await queueEmail(refund.email(client.email, company), transaction)).id;
			return null;
		});
	} catch (err) {
		if (deposit) await voidOrphanInvoice(deposit.stripeInvoiceId);
		throw err;
	}

	const mailSent = emailId === null ? undefined : await deliver((await OutboundEmail.findByPk(emailId))!);
	return { quote: await getQuote(id, actor), ...(mailSent !== undefined ? { mailSent } : {}) };
}

function depositMail(to: string, quote: QuoteDetail, issued: IssuedInvoice, company: string) {
	return invoiceEmail(to, quote, 'deposit', issued.amounts.amountMinor, issued.currency, issued.hostedUrl, company);
}

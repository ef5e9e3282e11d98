/** Moving a quote through its states: one row lock per move, illegal moves refused with 409. */
import { isExpired, nextStatus, type QuoteAction, type QuoteStatus } from '$lib/quotes/states';
import { quoteTerms, validUntilFor } from '$lib/quotes/terms';
import type { QuoteActionInput } from '$lib/schemas/quotes';
import { db, Client, OutboundEmail, Quote } from '../db';
import { deliver, queueEmail } from '../mail/outbox';
import { invoiceEmail } from '../mail/payment-emails';
import { quoteSentEmail } from '../mail/quote-emails';
import { contactAccountFor, createSignInLink } from '../auth/sign-in-links';
import type { SessionUser } from '../auth/signed-in-user';
import { cancelMoney } from './cancellation';
import { noteForDesk } from './desk-notices';
import { DomainError } from './errors';
import { issueStripeInvoice, saveIssuedInvoice, voidOrphanInvoice, type IssuedInvoice } from './invoices';
import { quoteDocumentFor } from './quote-document';
import type { QuoteDetail } from '$lib/quotes/types';
import { getQuote } from './quotes';
import { releaseBooking, shortfallsNow } from './bookings';
import { getSettings, type Settings } from './settings';

// Deposit and confirmation follow a paid invoice; nobody moves a quote there by hand.
const STAFF_ACTIONS: readonly QuoteAction[] = ['send', 'accept', 'cancel', 'close'];
const CLIENT_ACTIONS: readonly QuoteAction[] = ['accept', 'decline', 'request-change'];
const CLIENT_ANSWERS = { decline: 'declined', 'request-change': 'change-requested' } as const;

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

const today = () => new Date().toISOString().slice(0, 10);

/** The terms as the client sees them on the quote (and as they are stored on acceptance). */
export function termsFor(quote: QuoteDetail, settings: Settings): string[] {
	const p = quote.result.price;
	return quoteTerms({
		depositMinor: p.depositMinor,
		depositBp: p.depositBp,
		currency: p.currency,
		paymentTermsDays: settings.paymentTermsDays,
		cancellationFullRefundDays: settings.cancellationFullRefundDays,
		validUntil: quote.validUntil
	});
}

/** Refusals that need no lock: checked before any money moves, so a refused accept changes nothing. */
function refuseEarly(before: QuoteDetail, input: QuoteActionInput, actor: SessionUser): void {
	if (input.action === 'accept' && isExpired(before.validUntil, today())) {
		throw new DomainError(409, `This quote was valid until ${before.validUntil} and can no longer be accepted. Ask us for a fresh one.`);
	}
	if (input.action === 'accept' && actor.role === 'client' && input.acceptTerms !== true) {
		throw new DomainError(422, 'Read the terms and tick the box to accept them.', { acceptTerms: ['Tick to confirm you accept the terms'] });
	}
	if (input.action === 'request-change' && !input.message) {
		throw new DomainError(422, 'Tell us what you would like changed.', { message: ['Describe the change you need'] });
	}
}

/** A quote whose units were booked for another hire meanwhile cannot be accepted as it stands. */
async function refuseShortStock(before: QuoteDetail): Promise<void> {
	const short = await shortfallsNow(before.id, before.version);
	if (short.length === 0) return;
	const lines = short.map((s) => `${s.name}: ${s.missing} short`).join('; ');
	throw new DomainError(409, `Some of this system's equipment has been booked for another hire on these dates (${lines}). Ask us for a fresh quote.`);
}

export async function applyQuoteAction(id: number, input: QuoteActionInput | QuoteAction, actor: SessionUser): Promise<ActionOutcome> {
	const request: QuoteActionInput = typeof input === 'string' ? { action: input } : input;
	const { action } = request;
	const allowed = actor.role === 'client' ? CLIENT_ACTIONS : STAFF_ACTIONS;
	if (!allowed.includes(action)) throw new DomainError(403, 'Your role cannot do that to a quote.');
	const before = await getQuote(id, actor); // 404 for a quote the actor may not see
	if (!nextStatus(before.status, action)) {
		throw new DomainError(409, `A quote that is ${before.status} cannot be given “${action}”.`);
	}
	refuseEarly(before, request, actor);
	if (action === 'accept') await refuseShortStock(before);

	// Money first, outside our transaction: if the payment service is down nothing below happens.
	const deposit = action === 'accept' ? await issueStripeInvoice(before, 'deposit') : null;
	const refund = action === 'cancel' ? await cancelMoney(before) : null;

	// Outside the transaction, so it never waits for a second pooled connection while holding locks.
	const settings = await getSettings();
	const company = settings.companyName;
	const attachment = action === 'send' ? await quoteDocumentFor(id, actor, { validUntil: validUntilFor(today(), settings.quoteValidityDays) }) : null;
	let emailIds: number[] = [];
	try {
		emailIds = await db().transaction(async (transaction) => {
			const quote = await Quote.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
			const next = quote && nextStatus(quote.status, action);
			if (!quote || !next) throw new DomainError(409, 'The quote changed meanwhile; reload and try again.');
			if (action === 'send' && quote.needsRecheck) {
				throw new DomainError(409, 'A specification this quote relies on has changed. Revise the quote before sending it.');
			}
			const stamp = TIMESTAMPS[next];
			await quote.update({ status: next, ...(stamp ? { [stamp]: new Date() } : {}) }, { transaction });
			const client = (await Client.findByPk(quote.clientId, { transaction }))!;
			const byClient = actor.role === 'client';
			if (action === 'cancel') await releaseBooking(id, transaction);
			if (action === 'send') {
				await quote.update({ validUntil: validUntilFor(today(), settings.quoteValidityDays), clientResponse: null }, { transaction });
				const account = await contactAccountFor(client, transaction);
				const token = await createSignInLink(account.id, `/quotes/${id}`, transaction);
				const sent = { ...before, status: next, validUntil: quote.validUntil };
				return [(await queueEmail({ ...quoteSentEmail(sent, client.email, company, token), attachments: attachment ? [attachment] : [] }, transaction)).id];
			}
			if (action === 'decline' || action === 'request-change') {
				await quote.update({ clientResponse: CLIENT_ANSWERS[action], clientMessage: request.message || null, respondedAt: new Date() }, { transaction });
				const notice = await noteForDesk(quote, CLIENT_ANSWERS[action], request.message || null, settings, transaction);
				return notice ? [notice] : [];
			}
			const ids: number[] = [];
			if (deposit) {
				await quote.update({ acceptedById: actor.id, acceptedTerms: termsFor(before, settings).join('\n'), clientResponse: null }, { transaction });
				await saveIssuedInvoice(id, 'deposit', deposit, transaction);
				ids.push((await queueEmail(depositMail(client.email, before, deposit, company), transaction)).id);
				const notice = byClient ? await noteForDesk(quote, 'accepted', null, settings, transaction) : null;
				if (notice) ids.push(notice);
			}
			if (refund) ids.push((await queueEmail(refund.email(client.email, company), transaction)).id);
			return ids;
		});
	} catch (err) {
		if (deposit) await voidOrphanInvoice(deposit.stripeInvoiceId);
		throw err;
	}

	// The client's own e-mail decides `mailSent`; a desk notice that fails stays queued for retry.
	let mailSent: boolean | undefined;
	for (const [i, emailId] of emailIds.entries()) {
		const sent = await deliver((await OutboundEmail.findByPk(emailId))!);
		if (i === 0) mailSent = sent;
	}
	return { quote: await getQuote(id, actor), ...(mailSent !== undefined ? { mailSent } : {}) };
}

function depositMail(to: string, quote: QuoteDetail, issued: IssuedInvoice, company: string) {
	return invoiceEmail(to, quote, 'deposit', issued.amounts.amountMinor, issued.currency, issued.hostedUrl, company);
}

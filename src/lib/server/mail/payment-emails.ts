import { formatMoney } from '$lib/quotes/pricing';
import { formatDate, formatDateRange } from '$lib/format/dates';
import type { EmailMessage } from './outbox';
import { publicOrigin } from './transport';

interface QuoteRef {
	id: number;
	reference: string;
	eventName: string;
	startDate: string;
	endDate: string;
}

const quoteLink = (q: QuoteRef) => `${publicOrigin()}/signin?redirectTo=${encodeURIComponent(`/quotes/${q.id}`)}`;

function message(to: string, q: QuoteRef, subject: string, lines: string[], company: string): EmailMessage {
	const text = [...lines, `Your quote and invoices: ${quoteLink(q)}`, company].join('\n\n');
	return { to, subject, text, quoteId: q.id };
}

export function invoiceEmail(to: string, q: QuoteRef, kind: 'deposit' | 'balance', amountMinor: number, currency: string, payUrl: string | null, company: string): EmailMessage {
	const what = kind === 'deposit' ? 'deposit' : 'balance';
	return message(to, q, `Invoice for the ${what} of ${q.reference} ${q.eventName}`, [
		`Thank you for ${kind === 'deposit' ? 'accepting' : 'hiring with us for'} ${q.eventName} (${formatDateRange(q.startDate, q.endDate)}).`,
		`The ${what} is ${formatMoney(amountMinor, currency)}.${kind === 'deposit' ? ' Your booking is confirmed and the equipment reserved once it is paid.' : ''}`,
		payUrl ? `Pay online here: ${payUrl}` : 'We will send the payment link separately.'
	], company);
}

export function receiptEmail(to: string, q: QuoteRef, amountMinor: number, currency: string, company: string): EmailMessage {
	return message(to, q, `Payment received for ${q.reference} ${q.eventName}`, [
		`We have received your payment of ${formatMoney(amountMinor, currency)} for ${q.eventName}. Thank you.`
	], company);
}

export function bookingConfirmedEmail(to: string, q: QuoteRef, company: string): EmailMessage {
	return message(to, q, `Booking confirmed: ${q.eventName}, ${formatDate(q.startDate)}`, [
		`Your hire for ${q.eventName} on ${formatDateRange(q.startDate, q.endDate)} is confirmed and the equipment is reserved for you.`
	], company);
}

export function bookingHeldUpEmail(to: string, q: QuoteRef, company: string): EmailMessage {
	return message(to, q, `We have your deposit for ${q.reference}: we will be in touch`, [
		`Your deposit for ${q.eventName} has arrived, thank you. Part of the equipment quoted is no longer free on ${formatDateRange(q.startDate, q.endDate)}; our hire desk will contact you with an alternative or a refund. Your payment is safe.`
	], company);
}

export function cancellationEmail(to: string, q: QuoteRef, refundMinor: number, currency: string, company: string): EmailMessage {
	return message(to, q, `Cancelled: ${q.reference} ${q.eventName}`, [
		`The hire for ${q.eventName} (${formatDateRange(q.startDate, q.endDate)}) has been cancelled.`,
		refundMinor > 0 ? `We are refunding ${formatMoney(refundMinor, currency)} to the card you paid with.` : 'No refund is due under the cancellation terms.'
	], company);
}

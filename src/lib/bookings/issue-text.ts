/**
 * What the desk reads when a booking cannot go ahead as paid for, and how a hire's state or a sent
 * e-mail's state is written: always in words, never the stored code. Pure.
 */
import { QUOTE_STATUS_LABELS, type QuoteStatus } from '../quotes/states';
import { STATE_LABELS, type BookingState } from './states';

export function paidOutOfTurnIssue(status: QuoteStatus): string {
	return `Deposit paid while the quote was ${QUOTE_STATUS_LABELS[status].toLowerCase()}: refund or re-book it.`;
}

export function stockShortIssue(shortfalls: { name: string; missing: number }[]): string {
	const lines = shortfalls.map((s) => `${s.name}: ${s.missing} more needed than are free`).join('; ');
	return `Deposit paid but not enough units on the dates (${lines}).`;
}

/** A hire's state for a list ("Confirmed", "Out"); an unknown code is named as such, not shown raw. */
export function bookingStateText(state: string): string {
	return STATE_LABELS[state as BookingState] ?? 'Unknown state';
}

const EMAIL_STATE_TEXT = { pending: 'waiting to be sent', sending: 'being sent', sent: 'sent', failed: 'not sent yet, will be retried' } as const;

export function emailStateText(status: string): string {
	return EMAIL_STATE_TEXT[status as keyof typeof EMAIL_STATE_TEXT] ?? 'unknown';
}

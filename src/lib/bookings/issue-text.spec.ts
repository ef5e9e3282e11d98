import { describe, expect, it } from 'vitest';
import { bookingStateText, emailStateText, paidOutOfTurnIssue, stockShortIssue } from './issue-text';

describe('booking problems and states in words', () => {
	it('names the quote status as the desk reads it, not its code', () => {
		expect(paidOutOfTurnIssue('cancelled')).toBe('Deposit paid while the quote was cancelled: refund or re-book it.');
		expect(paidOutOfTurnIssue('sent')).toBe('Deposit paid while the quote was sent to client: refund or re-book it.');
	});

	it('says how many more are needed than are free, per model', () => {
		expect(stockShortIssue([{ name: 'Top 12', missing: 2 }, { name: 'Sub 18', missing: 1 }])).toBe(
			'Deposit paid but not enough units on the dates (Top 12: 2 more needed than are free; Sub 18: 1 more needed than are free).'
		);
	});

	it('writes a hire state and an e-mail state in words', () => {
		expect(bookingStateText('confirmed')).toBe('Confirmed');
		expect(bookingStateText('cancelled')).toBe('Cancelled');
		expect(emailStateText('failed')).toBe('not sent yet, will be retried');
		expect(emailStateText('pending')).toBe('waiting to be sent');
	});
});

import { describe, expect, it } from 'vitest';
import { cancelConsequences } from './cancel-consequence';

const base = { startDate: '2031-06-30', today: '2031-05-01', cancellationFullRefundDays: 28 };
const deposit = { kind: 'deposit' as const, status: 'paid' as const, amountMinor: 45_000, refundedMinor: 0, currency: 'GBP' };

describe('what cancelling a quote will do, in words', () => {
	it('a draft: cancelled for good, the client told', () => {
		expect(cancelConsequences({ ...base, status: 'draft', invoices: [] })).toEqual([
			'The quote is cancelled for good and cannot be sent or accepted again.',
			'The client is told by e-mail.'
		]);
	});

	it('a confirmed hire well ahead: the deposit refunded in full, stock released', () => {
		const lines = cancelConsequences({ ...base, status: 'confirmed', invoices: [deposit] });
		expect(lines).toContain('The deposit of £450.00 is refunded to the client in full.');
		expect(lines).toContain('Stock reserved for the hire is released.');
	});

	it('inside the refund window: the deposit is kept, and it says why', () => {
		const lines = cancelConsequences({ ...base, today: '2031-06-20', status: 'confirmed', invoices: [deposit] });
		expect(lines).toContain('The deposit of £450.00 is kept: the hire starts within 28 days, so the cancellation terms give no refund.');
	});

	it('an accepted quote: the open deposit invoice is withdrawn', () => {
		expect(cancelConsequences({ ...base, status: 'accepted', invoices: [{ ...deposit, status: 'open' }] })).toContain('Unpaid invoices are withdrawn.');
	});
});

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { priceHire } from './pricing';
import { balanceAmounts, depositAmounts, depositRefundMinor } from './invoice-split';

describe('deposit and balance', () => {
	it('splits a total with tax into two invoices that add up exactly', () => {
		const price = priceHire([{ description: 'x', quantity: 3, dayRateMinor: 3333 }], '2030-01-01', '2030-01-01', {
			rule: 'daily', taxRateBp: 2000, depositBp: 3000, currency: 'GBP'
		});
		expect(price.totalMinor).toBe(11999);
		expect(depositAmounts(price)).toEqual({ amountMinor: 3600, taxMinor: 600 });
		expect(balanceAmounts(price)).toEqual({ amountMinor: 8399, taxMinor: 1400 });
	});
	it('always adds up, for any lines, tax and deposit rate', () => {
		fc.assert(
			fc.property(fc.integer({ min: 0, max: 9_999_999 }), fc.integer({ min: 0, max: 5000 }), fc.integer({ min: 0, max: 10000 }), (rate, tax, dep) => {
				const price = priceHire([{ description: 'x', quantity: 1, dayRateMinor: rate }], '2030-01-01', '2030-01-02', { rule: 'daily', taxRateBp: tax, depositBp: dep, currency: 'EUR' });
				const d = depositAmounts(price);
				const b = balanceAmounts(price);
				return d.amountMinor + b.amountMinor === price.totalMinor && d.taxMinor + b.taxMinor === price.taxMinor && d.taxMinor <= d.amountMinor && b.taxMinor >= 0;
			})
		);
	});
});

describe('cancellation rule', () => {
	it('refunds the deposit in full only when cancelled early enough', () => {
		expect(depositRefundMinor(5000, '2030-05-01', '2030-05-29', 28)).toBe(5000);
		expect(depositRefundMinor(5000, '2030-05-02', '2030-05-29', 28)).toBe(0);
	});
});

import { describe, expect, it } from 'vitest';
import { isExpired } from './states';
import { quoteTerms, validUntilFor } from './terms';

describe('quote terms and validity', () => {
	it('counts the validity in calendar days across a month and a year end', () => {
		expect(validUntilFor('2031-01-31', 30)).toBe('2031-03-02');
		expect(validUntilFor('2031-12-15', 30)).toBe('2032-01-14');
	});

	it('lets a quote be accepted on its last valid day, not the day after', () => {
		expect(isExpired('2031-03-02', '2031-03-02')).toBe(false);
		expect(isExpired('2031-03-02', '2031-03-03')).toBe(true);
		expect(isExpired(null, '2031-03-03')).toBe(false);
	});

	it('states the deposit, the cancellation rule and the last day in the terms', () => {
		const terms = quoteTerms({ depositMinor: 12_345, depositBp: 3000, currency: 'EUR', paymentTermsDays: 14, cancellationFullRefundDays: 28, validUntil: '2031-03-02' }).join(' ');
		expect(terms).toContain('30 %');
		expect(terms).toContain('at least 28 days before');
		expect(terms).toContain('until 2 Mar 2031');
		expect(terms).toMatch(/123\.45/);
	});
});

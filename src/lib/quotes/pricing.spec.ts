import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { dayRateFactorMilli, formatMoney, priceHire, share } from './pricing';

const settings = { rule: 'daily' as const, taxRateBp: 2000, depositBp: 3000, currency: 'GBP' };

describe('day-rate factor per pricing rule', () => {
	it('daily: one day rate per hire day', () => {
		expect([1, 2, 5].map((d) => dayRateFactorMilli('daily', d))).toEqual([1000, 2000, 5000]);
	});
	it('extra days at half rate', () => {
		expect([1, 2, 3, 7].map((d) => dayRateFactorMilli('extra-days-half', d))).toEqual([1000, 1500, 2000, 4000]);
	});
	it('three-day week (common practice in dry hire): a week costs three days', () => {
		expect([1, 2, 3, 4, 6, 7, 8, 10, 11, 14].map((d) => dayRateFactorMilli('three-day-week', d) / 1000)).toEqual([
			1, 2, 3, 3, 3, 3, 4, 6, 6, 6
		]);
	});
	it('never charges less for a longer hire', () => {
		for (const rule of ['daily', 'extra-days-half', 'three-day-week'] as const) {
			fc.assert(
				fc.property(fc.integer({ min: 1, max: 60 }), (d) => dayRateFactorMilli(rule, d + 1) >= dayRateFactorMilli(rule, d))
			);
		}
	});
	it('refuses a hire of no days', () => {
		expect(() => dayRateFactorMilli('daily', 0)).toThrow(/at least one/);
	});
});

describe('priceHire', () => {
	it('prices lines, tax and deposit in whole minor units', () => {
		const price = priceHire(
			[
				{ description: 'Top', quantity: 4, dayRateMinor: 4500 },
				{ description: 'Amplifier', quantity: 1, dayRateMinor: 6000 }
			],
			'2027-06-12',
			'2027-06-14',
			{ ...settings, rule: 'extra-days-half' }
		);
		expect(price.hireDays).toBe(3);
		expect(price.lines.map((l) => l.amountMinor)).toEqual([36000, 12000]);
		expect(price.subtotalMinor).toBe(48000);
		expect(price.taxMinor).toBe(9600);
		expect(price.totalMinor).toBe(57600);
		expect(price.depositMinor).toBe(17280);
		expect(price.balanceMinor).toBe(40320);
	});

	it('rounds half away from zero once, and deposit + balance always equals the total', () => {
		expect(share(1005, 1, 10)).toBe(101);
		expect(share(-1005, 1, 10)).toBe(-101);
		fc.assert(
			fc.property(
				fc.array(fc.record({ quantity: fc.integer({ min: 1, max: 40 }), dayRateMinor: fc.integer({ min: 0, max: 500_000 }) }), { maxLength: 8 }),
				fc.integer({ min: 0, max: 3000 }),
				fc.integer({ min: 0, max: 10_000 }),
				(lines, taxRateBp, depositBp) => {
					const p = priceHire(
						lines.map((l) => ({ ...l, description: 'x' })),
						'2027-01-01',
						'2027-01-09',
						{ rule: 'three-day-week', taxRateBp, depositBp, currency: 'EUR' }
					);
					return (
						Number.isInteger(p.totalMinor) &&
						p.depositMinor + p.balanceMinor === p.totalMinor &&
						p.subtotalMinor + p.taxMinor === p.totalMinor
					);
				}
			)
		);
	});

	it('refuses dates in the wrong order or not real', () => {
		expect(() => priceHire([], '2027-06-14', '2027-06-12', settings)).toThrow(/cannot end before/);
		expect(() => priceHire([], '2027-02-30', '2027-03-01', settings)).toThrow(/real dates/);
	});
});

describe('formatMoney', () => {
	it('shows minor units as currency', () => {
		expect(formatMoney(123456, 'GBP')).toBe('£1,234.56');
		expect(formatMoney(1500, 'JPY')).toMatch(/¥1,500$/); // no minor unit in yen
	});
});

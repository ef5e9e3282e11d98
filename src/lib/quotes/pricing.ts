/**
 * Hire pricing in integer minor units (pence, cents). Rates and percentages are integers too:
 * factors in thousandths of a day rate, tax and deposit in basis points (1 % = 100 bp), so every
 * sum is exact and rounding happens once per line, half away from zero.
 */
import { hireDays } from './hire-days';

export const PRICING_RULES = ['daily', 'extra-days-half', 'three-day-week'] as const;
export type PricingRule = (typeof PRICING_RULES)[number];

export const PRICING_RULE_LABELS: Record<PricingRule, string> = {
	daily: 'Every hire day at the full day rate',
	'extra-days-half': 'First day full rate, each further day at half rate',
	'three-day-week': 'Three day rates per week; up to three day rates for the days after whole weeks'
};

/** How many day rates (in thousandths) a hire of `days` days costs under a rule. */
export function dayRateFactorMilli(rule: PricingRule, days: number): number {
	if (!Number.isInteger(days) || days < 1) throw new Error('A hire lasts at least one whole day');
	switch (rule) {
		case 'daily':
			return days * 1000;
		case 'extra-days-half':
			return 1000 + (days - 1) * 500;
		case 'three-day-week':
			return (Math.floor(days / 7) * 3 + Math.min(days % 7, 3)) * 1000;
	}
}

export interface PriceLineInput {
	description: string;
	quantity: number;
	dayRateMinor: number;
}

export interface PriceLine extends PriceLineInput {
	amountMinor: number;
}

export interface PriceSettings {
	rule: PricingRule;
	taxRateBp: number;
	depositBp: number;
	currency: string;
}

export interface Price {
	currency: string;
	hireDays: number;
	rule: PricingRule;
	factorMilli: number;
	lines: PriceLine[];
	subtotalMinor: number;
	taxRateBp: number;
	taxMinor: number;
	totalMinor: number;
	depositBp: number;
	depositMinor: number;
	balanceMinor: number;
}

/** Integer share `amount × parts / whole`, rounded half away from zero. */
export function share(amountMinor: number, parts: number, whole: number): number {
	const exact = (amountMinor * parts) / whole;
	return Math.sign(exact) * Math.round(Math.abs(exact));
}

export function priceHire(
	lines: PriceLineInput[],
	startDate: string,
	endDate: string,
	settings: PriceSettings
): Price {
	const days = hireDays(startDate, endDate);
	const factorMilli = dayRateFactorMilli(settings.rule, days);
	const priced = lines.map((line) => ({
		...line,
		amountMinor: share(line.quantity * line.dayRateMinor, factorMilli, 1000)
	}));
	const subtotalMinor = priced.reduce((sum, line) => sum + line.amountMinor, 0);
	const taxMinor = share(subtotalMinor, settings.taxRateBp, 10_000);
	const totalMinor = subtotalMinor + taxMinor;
	const depositMinor = share(totalMinor, settings.depositBp, 10_000);
	return {
		currency: settings.currency,
		hireDays: days,
		rule: settings.rule,
		factorMilli,
		lines: priced,
		subtotalMinor,
		taxRateBp: settings.taxRateBp,
		taxMinor,
		totalMinor,
		depositBp: settings.depositBp,
		depositMinor,
		balanceMinor: totalMinor - depositMinor
	};
}

/** Formats minor units for people, e.g. 123456 GBP → "£1,234.56". */
export function formatMoney(amountMinor: number, currency: string, locale = 'en-GB'): string {
	const digits = new Intl.NumberFormat(locale, { style: 'currency', currency }).resolvedOptions()
		.maximumFractionDigits ?? 2;
	return new Intl.NumberFormat(locale, { style: 'currency', currency }).format(
		amountMinor / 10 ** digits
	);
}

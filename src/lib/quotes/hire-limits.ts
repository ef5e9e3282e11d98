/**
 * Bounds on a hire the desk can quote. A year is far beyond any event hire (common practice: days
 * to a few weeks; a season at most), and the cap keeps every price inside the money columns.
 * Change MAX_HIRE_DAYS here if a company ever hires for longer.
 */
export const MAX_HIRE_DAYS = 365;

/**
 * The largest amount the payment service takes in one charge or invoice: Stripe's limit is eight
 * digits in minor units (99,999,999, e.g. £999,999.99), from its documentation on amounts.
 */
export const MAX_CHARGE_MINOR = 99_999_999;

export function chargeTooLarge(amountMinor: number): boolean {
	return !Number.isFinite(amountMinor) || amountMinor > MAX_CHARGE_MINOR;
}

/** Today as YYYY-MM-DD in the time zone of the machine running this (the server's, for the API). */
export function localIsoDate(now: Date): string {
	const pad = (n: number) => String(n).padStart(2, '0');
	return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}

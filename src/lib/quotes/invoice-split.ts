/** How a quote's total splits into a deposit invoice and a balance invoice, tax included in each. */
import { share, type Price } from './pricing';

export interface InvoiceAmounts {
	/** What the client pays, tax included. */
	amountMinor: number;
	/** The tax inside amountMinor, in proportion to the quote's tax. */
	taxMinor: number;
}

export function depositAmounts(price: Price): InvoiceAmounts {
	const amountMinor = price.depositMinor;
	const taxMinor = price.totalMinor === 0 ? 0 : share(amountMinor, price.taxMinor, price.totalMinor);
	return { amountMinor, taxMinor };
}

/** The rest: deposit + balance always add up to the quote's total and its tax, to the penny. */
export function balanceAmounts(price: Price): InvoiceAmounts {
	const deposit = depositAmounts(price);
	return { amountMinor: price.totalMinor - deposit.amountMinor, taxMinor: price.taxMinor - deposit.taxMinor };
}

/**
 * The deposit back on cancellation: in full when cancelled at least `fullRefundDays` before the hire
 * starts, otherwise kept (the company's cancellation rule).
 */
export function depositRefundMinor(depositPaidMinor: number, todayIso: string, startDateIso: string, fullRefundDays: number): number {
	const days = Math.floor((Date.parse(`${startDateIso}T00:00:00Z`) - Date.parse(`${todayIso}T00:00:00Z`)) / 86_400_000);
	return days >= fullRefundDays ? depositPaidMinor : 0;
}

/** The terms a client accepts with a quote, in plain words, from the company's settings. Pure. */
import { formatMoney } from './pricing';
import { formatDate } from '../format/dates';

export interface TermsInput {
	depositMinor: number;
	depositBp: number;
	currency: string;
	paymentTermsDays: number;
	cancellationFullRefundDays: number;
	validUntil: string | null;
}

export function quoteTerms(t: TermsInput): string[] {
	return [
		`Accepting this quote asks for a deposit of ${formatMoney(t.depositMinor, t.currency)} (${t.depositBp / 100} % of the total), due within ${t.paymentTermsDays} days of the invoice. The equipment is reserved for you once the deposit is paid.`,
		`The balance is invoiced after the booking is confirmed and is due within ${t.paymentTermsDays} days of that invoice.`,
		`Cancellation: cancel at least ${t.cancellationFullRefundDays} days before the hire starts and the deposit is refunded in full; later than that, the deposit is kept.`,
		t.validUntil ? `This quote can be accepted until ${formatDate(t.validUntil)}; after that, ask us for a fresh one.` : 'This quote can be accepted once it has been sent to you.',
		'Predicted levels are not a guarantee of the level on the day: the cautions in this quote apply.'
	];
}

/** The last day a quote sent on `sentOn` may be accepted. */
export function validUntilFor(sentOn: string, validityDays: number): string {
	const day = new Date(`${sentOn}T00:00:00Z`);
	day.setUTCDate(day.getUTCDate() + validityDays);
	return day.toISOString().slice(0, 10);
}

/**
 * What cancelling a quote will do, said before the desk confirms it: invoices voided, the deposit
 * refunded or kept under the cancellation terms, stock released, the client e-mailed. Pure; it
 * mirrors cancelMoney and the cancel action, so the words match what happens.
 */
import { depositRefundMinor } from './invoice-split';
import { formatMoney } from './pricing';
import type { QuoteStatus } from './states';

export interface CancelFacts {
	status: QuoteStatus;
	startDate: string;
	today: string;
	cancellationFullRefundDays: number;
	invoices: { kind: 'deposit' | 'balance'; status: 'open' | 'paid' | 'void'; amountMinor: number; refundedMinor: number; currency: string }[];
}

export function cancelConsequences(f: CancelFacts): string[] {
	const lines = ['The quote is cancelled for good and cannot be sent or accepted again.'];
	if (f.invoices.some((i) => i.status === 'open')) lines.push('Unpaid invoices are withdrawn.');
	for (const d of f.invoices.filter((i) => i.kind === 'deposit' && i.status === 'paid')) {
		const held = d.amountMinor - d.refundedMinor;
		if (held <= 0) continue;
		const refund = depositRefundMinor(held, f.today, f.startDate, f.cancellationFullRefundDays);
		lines.push(
			refund > 0
				? `The deposit of ${formatMoney(held, d.currency)} is refunded to the client in full.`
				: `The deposit of ${formatMoney(held, d.currency)} is kept: the hire starts within ${f.cancellationFullRefundDays} days, so the cancellation terms give no refund.`
		);
	}
	if (f.status === 'confirmed' || f.status === 'deposit-paid') lines.push('Stock reserved for the hire is released.');
	lines.push('The client is told by e-mail.');
	return lines;
}

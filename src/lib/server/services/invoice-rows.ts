import type { InvoiceRow } from '$lib/quotes/types';
import { Invoice } from '../db';

export function toInvoiceRow(i: Invoice): InvoiceRow {
	return {
		id: i.id,
		kind: i.kind,
		number: i.number,
		status: i.status,
		amountMinor: i.amountMinor,
		taxMinor: i.taxMinor,
		refundedMinor: i.refundedMinor,
		currency: i.currency,
		hostedUrl: i.hostedUrl,
		lastPaymentError: i.lastPaymentError,
		paidAt: i.paidAt?.toISOString() ?? null
	};
}

export async function invoicesFor(quoteId: number): Promise<InvoiceRow[]> {
	return (await Invoice.findAll({ where: { quoteId }, order: [['id', 'ASC']] })).map(toInvoiceRow);
}


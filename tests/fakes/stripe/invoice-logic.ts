// Invoice state machine (draft → open → paid | void | uncollectible; uncollectible → paid | void) and
// totals. Throwline computes tax itself and sends it as its own line, so total = sum of the lines.
import type { Deps } from './context';
import { invalid, noSuch } from './errors';
import { nowSeconds } from './ids';
import { renderInvoice } from './render';
import type { State } from './store';
import type { Invoice, InvoiceStatus } from './types';

export function getInvoice(state: State, id: string): Invoice {
	const invoice = state.invoices[id];
	if (!invoice) throw noSuch('invoice', id);
	return invoice;
}

export function recomputeTotals(state: State, invoice: Invoice): void {
	const subtotal = invoice.item_ids.reduce((sum, id) => sum + state.invoiceItems[id].amount, 0);
	invoice.subtotal = subtotal;
	invoice.subtotal_excluding_tax = subtotal;
	invoice.total = subtotal;
	invoice.total_excluding_tax = subtotal;
	// A negative total is owed to the customer, not by them: nothing is due.
	invoice.amount_due = Math.max(0, subtotal);
	invoice.amount_remaining = Math.max(0, invoice.amount_due - invoice.amount_paid);
}

const WHAT_YOU_CAN_DO: Record<string, InvoiceStatus[]> = {
	finalize: ['draft'],
	edit: ['draft'],
	delete: ['draft'],
	pay: ['open', 'uncollectible'],
	void: ['open', 'uncollectible'],
	send: ['open'],
	mark_uncollectible: ['open']
};

/** Refuses an illegal transition with Stripe's 400 invalid_request_error. */
export function requireStatus(invoice: Invoice, action: keyof typeof WHAT_YOU_CAN_DO): void {
	const allowed = WHAT_YOU_CAN_DO[action];
	if (allowed.includes(invoice.status)) return;
	const messages: Record<string, string> = {
		finalize: `This invoice is already finalized, you can't re-finalize a non-draft invoice.`,
		edit: `You can only modify draft invoices. This invoice (${invoice.id}) has status ${invoice.status}.`,
		delete: `You can only delete draft invoices. This invoice (${invoice.id}) has status ${invoice.status}.`,
		pay:
			invoice.status === 'paid'
				? 'Invoice is already paid'
				: `You can only pay open or uncollectible invoices. This invoice (${invoice.id}) has status ${invoice.status}.`,
		void: `You can only void open or uncollectible invoices. This invoice (${invoice.id}) has status ${invoice.status}.`,
		send: `You can only send open invoices. This invoice (${invoice.id}) has status ${invoice.status}.`,
		mark_uncollectible: `You can only mark open invoices as uncollectible. This invoice (${invoice.id}) has status ${invoice.status}.`
	};
	throw invalid(
		messages[action],
		action === 'finalize' || action === 'edit' ? 'invoice_not_editable' : undefined
	);
}

export function emitInvoice(
	deps: Deps,
	type: string,
	invoice: Invoice,
	previous?: Record<string, unknown>
): void {
	deps.events.emit(type, renderInvoice(deps.store.state, invoice), deps.request, previous);
}

export function finalizeInvoice(deps: Deps, invoice: Invoice): void {
	requireStatus(invoice, 'finalize');
	const state = deps.store.state;
	const now = nowSeconds();
	recomputeTotals(state, invoice);
	const customer = state.customers[invoice.customer];
	state.invoiceSequence += 1;
	invoice.number = `${state.numberPrefix}-${String(state.invoiceSequence).padStart(4, '0')}`;
	invoice.status = 'open';
	invoice.status_transitions.finalized_at = now;
	invoice.effective_at = now;
	invoice.ending_balance = 0;
	invoice.customer_email = customer?.email ?? null;
	invoice.customer_name = customer?.name ?? null;
	invoice.hosted_invoice_url = `${deps.baseUrl}/pay/${invoice.id}`;
	invoice.invoice_pdf = null;
	emitInvoice(deps, 'invoice.finalized', invoice, { status: 'draft' });
	// Stripe marks an invoice with nothing due as paid the moment it is finalized.
	if (invoice.amount_due === 0) {
		invoice.status = 'paid';
		invoice.status_transitions.paid_at = now;
		emitInvoice(deps, 'invoice.paid', invoice, { status: 'open' });
	}
}

export function voidInvoice(deps: Deps, invoice: Invoice): void {
	requireStatus(invoice, 'void');
	const previous = invoice.status;
	invoice.status = 'void';
	invoice.status_transitions.voided_at = nowSeconds();
	invoice.amount_remaining = 0;
	emitInvoice(deps, 'invoice.voided', invoice, { status: previous });
}

export function markUncollectible(deps: Deps, invoice: Invoice): void {
	requireStatus(invoice, 'mark_uncollectible');
	invoice.status = 'uncollectible';
	invoice.status_transitions.marked_uncollectible_at = nowSeconds();
	emitInvoice(deps, 'invoice.marked_uncollectible', invoice, { status: 'open' });
}

export function sendInvoice(deps: Deps, invoice: Invoice): void {
	requireStatus(invoice, 'send');
	if (invoice.collection_method !== 'send_invoice') {
		throw invalid(
			'You can only manually send an invoice if its collection method is `send_invoice`.'
		);
	}
	emitInvoice(deps, 'invoice.sent', invoice);
}

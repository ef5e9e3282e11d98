// Turns stored objects into what the API returns: invoices get their `lines` (and `payments` when
// expanded), internal bookkeeping fields are dropped, and `expand[]` swaps ids for objects.
import { noSuch } from './errors';
import type { Params } from './form';
import { int, str } from './form';
import type { State } from './store';
import type { Invoice, InvoiceItem } from './types';

export interface ApiList<T> {
	object: 'list';
	data: T[];
	has_more: boolean;
	url: string;
}

export function apiList<T>(data: T[], url: string, hasMore = false): ApiList<T> {
	return { object: 'list', data, has_more: hasMore, url };
}

/** limit (1–100, default 10), starting_after and ending_before over a newest-first array. */
export function paginate<T extends { id: string }>(
	items: T[],
	params: Params,
	url: string
): ApiList<T> {
	const limit = Math.min(Math.max(int(params, 'limit') ?? 10, 1), 100);
	const after = str(params, 'starting_after');
	const before = str(params, 'ending_before');
	let start = 0;
	let end = items.length;
	if (after) {
		const i = items.findIndex((x) => x.id === after);
		if (i < 0) throw noSuch('object', after, 'starting_after');
		start = i + 1;
	}
	if (before) {
		const i = items.findIndex((x) => x.id === before);
		if (i < 0) throw noSuch('object', before, 'ending_before');
		end = i;
		start = Math.max(start, end - limit);
	}
	const page = items.slice(start, Math.min(end, start + limit));
	return apiList(page, url, start + page.length < end);
}

export function renderInvoiceItem(item: InvoiceItem): Omit<InvoiceItem, 'line_id'> {
	const { line_id: _line, ...pub } = item;
	return pub;
}

function lineFromItem(item: InvoiceItem, invoiceId: string) {
	return {
		id: item.line_id,
		object: 'line_item' as const,
		amount: item.amount,
		currency: item.currency,
		description: item.description,
		discount_amounts: [],
		discountable: item.discountable,
		discounts: [],
		invoice: invoiceId,
		livemode: false as const,
		metadata: item.metadata,
		parent: {
			type: 'invoice_item_details',
			invoice_item_details: {
				invoice_item: item.id,
				proration: false,
				proration_details: { credited_items: null },
				subscription: null
			},
			subscription_item_details: null
		},
		period: item.period,
		pretax_credit_amounts: [],
		pricing: item.pricing,
		quantity: item.quantity,
		quantity_decimal: item.quantity_decimal,
		subtotal: item.amount,
		taxes: []
	};
}

export function invoiceLines(state: State, invoice: Invoice) {
	return invoice.item_ids.map((id) => lineFromItem(state.invoiceItems[id], invoice.id));
}

export function renderInvoice(
	state: State,
	invoice: Invoice,
	expand: string[] = []
): Record<string, unknown> {
	const { item_ids: _items, payment_ids: _payments, ...pub } = invoice;
	const lines = invoiceLines(state, invoice);
	const out: Record<string, unknown> = {
		...pub,
		lines: { ...apiList(lines, `/v1/invoices/${invoice.id}/lines`), total_count: lines.length }
	};
	// `payments` is an includable field on Stripe: present only when asked for.
	if (expand.includes('payments') || expand.some((e) => e.startsWith('payments.'))) {
		const payments = invoice.payment_ids.map((id) => state.invoicePayments[id]);
		out.payments = {
			...apiList(payments, `/v1/invoice_payments?invoice=${invoice.id}`),
			total_count: payments.length
		};
	}
	return applyExpand(
		state,
		out,
		expand.filter((e) => e !== 'payments')
	);
}

/** The stored object for an id, rendered without further expansion; null when unknown. */
function lookup(state: State, id: string): unknown {
	const [prefix] = id.split('_');
	switch (prefix) {
		case 'cus':
			return state.customers[id] ?? null;
		case 'in':
			return state.invoices[id] ? renderInvoice(state, state.invoices[id]) : null;
		case 'ii':
			return state.invoiceItems[id] ? renderInvoiceItem(state.invoiceItems[id]) : null;
		case 'pi':
			return state.paymentIntents[id] ?? null;
		case 'ch':
			return state.charges[id] ?? null;
		case 're':
			return state.refunds[id] ?? null;
		default:
			return null;
	}
}

/** Supports dotted paths (`payment_intent.latest_charge`, `data.customer` on lists). */
export function applyExpand<T>(state: State, value: T, expand: string[]): T {
	if (expand.length === 0 || typeof value !== 'object' || value === null) return value;
	const target = structuredClone(value) as Record<string, unknown>;
	for (const path of expand) expandPath(state, target, path.split('.'));
	return target as T;
}

function expandPath(state: State, node: Record<string, unknown>, segments: string[]): void {
	const [head, ...rest] = segments;
	const current = node[head];
	if (head === 'data' && Array.isArray(current)) {
		for (const item of current)
			if (typeof item === 'object' && item)
				expandPath(state, item as Record<string, unknown>, rest);
		return;
	}
	if (typeof current === 'string') {
		const found = lookup(state, current);
		if (found) node[head] = structuredClone(found);
	}
	const next = node[head];
	if (rest.length > 0 && typeof next === 'object' && next)
		expandPath(state, next as Record<string, unknown>, rest);
}

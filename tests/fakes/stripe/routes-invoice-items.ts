// /v1/invoiceitems: one priced line for a customer, either pending or attached to a draft invoice.
// Amount is `amount`, or `unit_amount_decimal` (or price_data[unit_amount(_decimal)]) × `quantity`.
import type { ApiContext, Route } from './context';
import { invalid, noSuch } from './errors';
import { allowOnly, bool, expandList, int, metadata, str, type Params } from './form';
import { newId, nowSeconds } from './ids';
import { getInvoice, recomputeTotals, requireStatus } from './invoice-logic';
import { applyExpand, paginate, renderInvoiceItem } from './render';
import { newestFirst } from './store';
import type { InvoiceItem } from './types';

const CREATE = [
	'amount',
	'currency',
	'customer',
	'customer_account',
	'description',
	'discountable',
	'discounts',
	'expand',
	'invoice',
	'metadata',
	'period',
	'price_data',
	'pricing',
	'quantity',
	'quantity_decimal',
	'subscription',
	'tax_behavior',
	'tax_code',
	'tax_rates',
	'unit_amount_decimal'
];

function decimal(value: string | undefined, param: string): number | undefined {
	if (value === undefined) return undefined;
	if (!/^-?\d+(\.\d{1,12})?$/.test(value))
		throw invalid(`Invalid decimal: ${value}`, 'parameter_invalid_decimal', param);
	return Number(value);
}

function priceOf(params: Params): { amount: number; unitDecimal: string | null; quantity: number } {
	const quantity =
		int(params, 'quantity') ?? decimal(str(params, 'quantity_decimal'), 'quantity_decimal') ?? 1;
	if (quantity < 0)
		throw invalid('Quantity must be non-negative.', 'parameter_invalid_integer', 'quantity');
	const priceData =
		typeof params.price_data === 'object' && !Array.isArray(params.price_data)
			? params.price_data
			: {};
	const amount = int(params, 'amount');
	const unit =
		decimal(str(params, 'unit_amount_decimal'), 'unit_amount_decimal') ??
		int(priceData, 'unit_amount') ??
		decimal(str(priceData, 'unit_amount_decimal'), 'price_data[unit_amount_decimal]');
	if (amount !== undefined && unit !== undefined) {
		throw invalid(
			'You may only specify one of these parameters: amount, unit_amount_decimal.',
			'parameter_unknown',
			'unit_amount_decimal'
		);
	}
	if (amount !== undefined)
		return {
			amount,
			unitDecimal: String(Number((quantity ? amount / quantity : amount).toFixed(12))),
			quantity
		};
	if (unit === undefined)
		throw invalid(
			'You must specify either `amount`, `unit_amount_decimal` or `price_data`.',
			'parameter_missing',
			'amount'
		);
	return { amount: Math.round(unit * quantity), unitDecimal: String(unit), quantity };
}

function create(ctx: ApiContext) {
	allowOnly(ctx.params, CREATE);
	const state = ctx.store.state;
	const invoiceId = str(ctx.params, 'invoice');
	const invoice = invoiceId ? getInvoice(state, invoiceId) : undefined;
	if (invoice) requireStatus(invoice, 'edit');
	const customerId = str(ctx.params, 'customer') ?? invoice?.customer;
	if (!customerId)
		throw invalid('Missing required param: customer.', 'parameter_missing', 'customer');
	const customer = state.customers[customerId];
	if (!customer) throw noSuch('customer', customerId, 'customer');
	if (invoice && invoice.customer !== customerId)
		throw invalid(
			'The invoice item and the invoice must belong to the same customer.',
			undefined,
			'invoice'
		);
	const currency = (
		str(ctx.params, 'currency') ??
		invoice?.currency ??
		customer.currency ??
		'usd'
	).toLowerCase();
	if (invoice && invoice.currency !== currency) {
		throw invalid(
			`The currency of the invoice item (${currency}) must match the invoice's currency (${invoice.currency}).`,
			undefined,
			'currency'
		);
	}
	const price = priceOf(ctx.params);
	const now = nowSeconds();
	const item: InvoiceItem = {
		id: newId('ii'),
		object: 'invoiceitem',
		amount: price.amount,
		currency,
		customer: customerId,
		date: now,
		description: str(ctx.params, 'description') ?? null,
		discountable: bool(ctx.params, 'discountable') ?? price.amount >= 0,
		discounts: [],
		invoice: invoice?.id ?? null,
		livemode: false,
		metadata: metadata(ctx.params),
		parent: null,
		period: { start: now, end: now },
		pricing: { type: 'price_details', price_details: null, unit_amount_decimal: price.unitDecimal },
		proration: false,
		// `quantity` is whole units on Stripe; the exact figure lives in quantity_decimal.
		quantity: Math.round(price.quantity),
		quantity_decimal: String(price.quantity),
		tax_rates: [],
		test_clock: null,
		line_id: newId('il')
	};
	state.invoiceItems[item.id] = item;
	if (invoice) {
		invoice.item_ids.push(item.id);
		recomputeTotals(state, invoice);
	}
	return { body: renderInvoiceItem(item) };
}

function getItem(ctx: ApiContext): InvoiceItem {
	const item = ctx.store.state.invoiceItems[ctx.ids[0]];
	if (!item) throw noSuch('invoiceitem', ctx.ids[0]);
	return item;
}

function remove(ctx: ApiContext) {
	const item = getItem(ctx);
	const state = ctx.store.state;
	if (item.invoice) {
		const invoice = getInvoice(state, item.invoice);
		requireStatus(invoice, 'edit');
		invoice.item_ids = invoice.item_ids.filter((id) => id !== item.id);
		recomputeTotals(state, invoice);
	}
	delete state.invoiceItems[item.id];
	return { body: { id: item.id, object: 'invoiceitem', deleted: true } };
}

function list(ctx: ApiContext) {
	allowOnly(ctx.params, [
		'created',
		'customer',
		'customer_account',
		'expand',
		'invoice',
		'pending',
		'limit',
		'starting_after',
		'ending_before'
	]);
	const customer = str(ctx.params, 'customer');
	const invoice = str(ctx.params, 'invoice');
	const pending = bool(ctx.params, 'pending');
	const items = newestFirst(ctx.store.state.invoiceItems)
		.filter((i) => (!customer || i.customer === customer) && (!invoice || i.invoice === invoice))
		.filter((i) => pending === undefined || (i.invoice === null) === pending)
		.map(renderInvoiceItem);
	return { body: paginate(items, ctx.params, '/v1/invoiceitems') };
}

export const invoiceItemRoutes: Route[] = [
	{ method: 'POST', pattern: /^\/v1\/invoiceitems$/, handler: create },
	{ method: 'GET', pattern: /^\/v1\/invoiceitems$/, handler: list },
	{
		method: 'GET',
		pattern: /^\/v1\/invoiceitems\/([^/]+)$/,
		handler: (ctx) => ({
			body: applyExpand(ctx.store.state, renderInvoiceItem(getItem(ctx)), expandList(ctx.params))
		})
	},
	{ method: 'DELETE', pattern: /^\/v1\/invoiceitems\/([^/]+)$/, handler: remove }
];

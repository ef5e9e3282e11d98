// /v1/invoices: create, retrieve, list, update, delete (draft), finalize, send, pay, void,
// mark_uncollectible, lines.
import type { ApiContext, ApiResult, Route } from './context';
import { invalid, missingParam, noSuch } from './errors';
import { allowOnly, bool, expandList, int, metadata, oneOf, requiredStr, str } from './form';
import { newId, nowSeconds } from './ids';
import {
	emitInvoice,
	finalizeInvoice,
	getInvoice,
	markUncollectible,
	recomputeTotals,
	requireStatus,
	sendInvoice,
	voidInvoice
} from './invoice-logic';
import { chargeInvoice, markPaid, TEST_CARD } from './payments';
import { apiList, invoiceLines, paginate, renderInvoice } from './render';
import { INVOICE_CREATE as CREATE, INVOICE_UPDATE as UPDATE } from './invoice-params';
import { newestFirst } from './store';
import type { Invoice } from './types';

const DAY = 86_400;

/** Test payment methods understood by POST /pay, after Stripe's own test ids. */
const DECLINING_METHODS = ['pm_card_chargeDeclined', 'pm_card_visa_chargeDeclined'];

function respond(ctx: ApiContext, invoice: Invoice): ApiResult {
	return { body: renderInvoice(ctx.store.state, invoice, expandList(ctx.params)) };
}

function current(ctx: ApiContext): Invoice {
	return getInvoice(ctx.store.state, ctx.ids[0]);
}

function create(ctx: ApiContext): ApiResult {
	allowOnly(ctx.params, CREATE);
	const state = ctx.store.state;
	const customerId = requiredStr(ctx.params, 'customer');
	const customer = state.customers[customerId];
	if (!customer) throw noSuch('customer', customerId, 'customer');
	const collection =
		oneOf(ctx.params, 'collection_method', ['charge_automatically', 'send_invoice'] as const) ??
		'charge_automatically';
	const daysUntilDue = int(ctx.params, 'days_until_due');
	const dueDate = int(ctx.params, 'due_date');
	const now = nowSeconds();
	if (collection === 'send_invoice' && daysUntilDue === undefined && dueDate === undefined)
		throw missingParam('days_until_due');
	if (collection !== 'send_invoice' && (daysUntilDue !== undefined || dueDate !== undefined)) {
		throw invalid(
			'Invoices with `collection_method=charge_automatically` cannot have a `due_date` or `days_until_due`.',
			undefined,
			'days_until_due'
		);
	}
	const currency = (str(ctx.params, 'currency') ?? customer.currency ?? 'usd').toLowerCase();
	const invoice: Invoice = {
		id: newId('in'),
		object: 'invoice',
		account_country: 'GB',
		account_name: ctx.accountName,
		amount_due: 0,
		amount_overpaid: 0,
		amount_paid: 0,
		amount_remaining: 0,
		amount_shipping: 0,
		attempt_count: 0,
		attempted: false,
		auto_advance: bool(ctx.params, 'auto_advance') ?? false,
		automatic_tax: { enabled: false, liability: null, status: null },
		billing_reason: 'manual',
		collection_method: collection,
		created: now,
		currency,
		customer: customerId,
		customer_email: customer.email,
		customer_name: customer.name,
		days_until_due: daysUntilDue ?? null,
		default_payment_method: null,
		description: str(ctx.params, 'description') ?? null,
		discounts: [],
		due_date: dueDate ?? (daysUntilDue !== undefined ? now + daysUntilDue * DAY : null),
		effective_at: null,
		ending_balance: null,
		footer: str(ctx.params, 'footer') ?? null,
		hosted_invoice_url: null,
		invoice_pdf: null,
		last_finalization_error: null,
		livemode: false,
		metadata: metadata(ctx.params),
		next_payment_attempt: null,
		number: null,
		parent: null,
		period_end: now,
		period_start: now,
		post_payment_credit_notes_amount: 0,
		pre_payment_credit_notes_amount: 0,
		receipt_number: null,
		starting_balance: 0,
		statement_descriptor: str(ctx.params, 'statement_descriptor') ?? null,
		status: 'draft',
		status_transitions: {
			finalized_at: null,
			marked_uncollectible_at: null,
			paid_at: null,
			voided_at: null
		},
		subtotal: 0,
		subtotal_excluding_tax: 0,
		test_clock: null,
		total: 0,
		total_discount_amounts: [],
		total_excluding_tax: 0,
		total_taxes: [],
		webhooks_delivered_at: null,
		charge: null,
		payment_intent: null,
		item_ids: [],
		payment_ids: []
	};
	// 'exclude' is Stripe's default: pending items stay pending unless asked for.
	if (
		oneOf(ctx.params, 'pending_invoice_items_behavior', ['include', 'exclude'] as const) ===
		'include'
	) {
		const pending = Object.values(state.invoiceItems).filter(
			(i) => i.customer === customerId && i.invoice === null && i.currency === currency
		);
		for (const item of pending) {
			item.invoice = invoice.id;
			invoice.item_ids.push(item.id);
		}
	}
	state.invoices[invoice.id] = invoice;
	recomputeTotals(state, invoice);
	emitInvoice(ctx, 'invoice.created', invoice);
	return respond(ctx, invoice);
}

function update(ctx: ApiContext): ApiResult {
	allowOnly(ctx.params, UPDATE);
	const invoice = current(ctx);
	const onlyMetadata = Object.keys(ctx.params).every((k) => k === 'metadata' || k === 'expand');
	// Stripe lets metadata change after finalization; everything else only on a draft.
	if (!onlyMetadata) requireStatus(invoice, 'edit');
	invoice.metadata = metadata(ctx.params, invoice.metadata);
	for (const field of ['description', 'footer', 'statement_descriptor'] as const) {
		if (ctx.params[field] !== undefined) invoice[field] = str(ctx.params, field) ?? null;
	}
	const days = int(ctx.params, 'days_until_due');
	if (days !== undefined) {
		invoice.days_until_due = days;
		invoice.due_date = invoice.created + days * DAY;
	}
	invoice.due_date = int(ctx.params, 'due_date') ?? invoice.due_date;
	invoice.auto_advance = bool(ctx.params, 'auto_advance') ?? invoice.auto_advance;
	emitInvoice(ctx, 'invoice.updated', invoice);
	return respond(ctx, invoice);
}

function remove(ctx: ApiContext): ApiResult {
	const invoice = current(ctx);
	requireStatus(invoice, 'delete');
	const state = ctx.store.state;
	for (const id of invoice.item_ids) delete state.invoiceItems[id];
	emitInvoice(ctx, 'invoice.deleted', invoice);
	delete state.invoices[invoice.id];
	return { body: { id: invoice.id, object: 'invoice', deleted: true } };
}

function list(ctx: ApiContext): ApiResult {
	allowOnly(ctx.params, [
		'collection_method',
		'created',
		'customer',
		'customer_account',
		'due_date',
		'expand',
		'status',
		'subscription',
		'limit',
		'starting_after',
		'ending_before'
	]);
	const customer = str(ctx.params, 'customer');
	const status = str(ctx.params, 'status');
	const state = ctx.store.state;
	const expand = expandList(ctx.params)
		.filter((e) => e.startsWith('data.'))
		.map((e) => e.slice(5));
	const invoices = newestFirst(state.invoices)
		.filter((i) => (!customer || i.customer === customer) && (!status || i.status === status))
		.map((i) => ({ ...renderInvoice(state, i, expand), id: i.id }));
	return { body: paginate(invoices, ctx.params, '/v1/invoices') };
}

function pay(ctx: ApiContext): ApiResult {
	allowOnly(ctx.params, [
		'expand',
		'forgive',
		'mandate',
		'off_session',
		'paid_out_of_band',
		'payment_method',
		'source'
	]);
	const invoice = current(ctx);
	requireStatus(invoice, 'pay');
	if (bool(ctx.params, 'paid_out_of_band')) {
		markPaid(ctx, invoice, invoice.amount_remaining, null);
		return respond(ctx, invoice);
	}
	const method = str(ctx.params, 'payment_method') ?? 'pm_card_visa';
	const result = chargeInvoice(ctx, invoice, TEST_CARD, DECLINING_METHODS.includes(method));
	if (!result.ok) throw result.error;
	return respond(ctx, invoice);
}

function transition(action: (ctx: ApiContext, invoice: Invoice) => void) {
	return (ctx: ApiContext): ApiResult => {
		allowOnly(ctx.params, ['expand', 'auto_advance']);
		const invoice = current(ctx);
		action(ctx, invoice);
		return respond(ctx, invoice);
	};
}

export const invoiceRoutes: Route[] = [
	{ method: 'POST', pattern: /^\/v1\/invoices$/, handler: create },
	{ method: 'GET', pattern: /^\/v1\/invoices$/, handler: list },
	{
		method: 'GET',
		pattern: /^\/v1\/invoices\/([^/]+)$/,
		handler: (ctx) => respond(ctx, current(ctx))
	},
	{ method: 'POST', pattern: /^\/v1\/invoices\/([^/]+)$/, handler: update },
	{ method: 'DELETE', pattern: /^\/v1\/invoices\/([^/]+)$/, handler: remove },
	{
		method: 'GET',
		pattern: /^\/v1\/invoices\/([^/]+)\/lines$/,
		handler: (ctx) => ({
			body: apiList(invoiceLines(ctx.store.state, current(ctx)), `/v1/invoices/${ctx.ids[0]}/lines`)
		})
	},
	{
		method: 'POST',
		pattern: /^\/v1\/invoices\/([^/]+)\/finalize$/,
		handler: transition(finalizeInvoice)
	},
	{ method: 'POST', pattern: /^\/v1\/invoices\/([^/]+)\/send$/, handler: transition(sendInvoice) },
	{ method: 'POST', pattern: /^\/v1\/invoices\/([^/]+)\/void$/, handler: transition(voidInvoice) },
	{
		method: 'POST',
		pattern: /^\/v1\/invoices\/([^/]+)\/mark_uncollectible$/,
		handler: transition(markUncollectible)
	},
	{ method: 'POST', pattern: /^\/v1\/invoices\/([^/]+)\/pay$/, handler: pay }
];

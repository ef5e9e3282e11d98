// /v1/refunds, and read access to what a payment leaves behind: charges, payment intents, invoice
// payments and events.
import type { ApiContext, Route } from './context';
import { noSuch } from './errors';
import { allowOnly, expandList, int, metadata, oneOf, str } from './form';
import { createRefund } from './payments';
import { applyExpand, paginate } from './render';
import { newestFirst, type State } from './store';

function create(ctx: ApiContext) {
	allowOnly(ctx.params, [
		'amount',
		'charge',
		'currency',
		'customer',
		'expand',
		'instructions_email',
		'metadata',
		'origin',
		'payment_intent',
		'reason',
		'refund_application_fee',
		'reverse_transfer'
	]);
	const refund = createRefund(ctx, {
		charge: str(ctx.params, 'charge'),
		payment_intent: str(ctx.params, 'payment_intent'),
		amount: int(ctx.params, 'amount'),
		reason: oneOf(ctx.params, 'reason', [
			'duplicate',
			'fraudulent',
			'requested_by_customer'
		] as const),
		metadata: metadata(ctx.params)
	});
	return { body: applyExpand(ctx.store.state, refund, expandList(ctx.params)) };
}

/** GET /v1/<collection>/:id for a stored record, with expand. */
function retrieve(key: 'refunds' | 'charges' | 'paymentIntents' | 'invoicePayments', kind: string) {
	return (ctx: ApiContext) => {
		const record = (ctx.store.state[key] as State[typeof key])[ctx.ids[0]];
		if (!record) throw noSuch(kind, ctx.ids[0]);
		return { body: applyExpand(ctx.store.state, record, expandList(ctx.params)) };
	};
}

function listRefunds(ctx: ApiContext) {
	const charge = str(ctx.params, 'charge');
	const intent = str(ctx.params, 'payment_intent');
	const refunds = newestFirst(ctx.store.state.refunds).filter(
		(r) => (!charge || r.charge === charge) && (!intent || r.payment_intent === intent)
	);
	return { body: paginate(refunds, ctx.params, '/v1/refunds') };
}

function listInvoicePayments(ctx: ApiContext) {
	const invoice = str(ctx.params, 'invoice');
	const payments = newestFirst(ctx.store.state.invoicePayments).filter(
		(p) => !invoice || p.invoice === invoice
	);
	return { body: paginate(payments, ctx.params, '/v1/invoice_payments') };
}

function listEvents(ctx: ApiContext) {
	const type = str(ctx.params, 'type');
	const events = newestFirst(ctx.store.state.events)
		.map((r) => r.event)
		.filter(
			(e) =>
				!type || e.type === type || (type.endsWith('.*') && e.type.startsWith(type.slice(0, -1)))
		);
	return { body: paginate(events, ctx.params, '/v1/events') };
}

function getEvent(ctx: ApiContext) {
	const record = ctx.store.state.events[ctx.ids[0]];
	if (!record) throw noSuch('event', ctx.ids[0]);
	return { body: record.event };
}

export const paymentRoutes: Route[] = [
	{ method: 'POST', pattern: /^\/v1\/refunds$/, handler: create },
	{ method: 'GET', pattern: /^\/v1\/refunds$/, handler: listRefunds },
	{ method: 'GET', pattern: /^\/v1\/refunds\/([^/]+)$/, handler: retrieve('refunds', 'refund') },
	{ method: 'GET', pattern: /^\/v1\/charges\/([^/]+)$/, handler: retrieve('charges', 'charge') },
	{
		method: 'GET',
		pattern: /^\/v1\/payment_intents\/([^/]+)$/,
		handler: retrieve('paymentIntents', 'payment_intent')
	},
	{ method: 'GET', pattern: /^\/v1\/invoice_payments$/, handler: listInvoicePayments },
	{
		method: 'GET',
		pattern: /^\/v1\/invoice_payments\/([^/]+)$/,
		handler: retrieve('invoicePayments', 'invoice_payment')
	},
	{ method: 'GET', pattern: /^\/v1\/events$/, handler: listEvents },
	{ method: 'GET', pattern: /^\/v1\/events\/([^/]+)$/, handler: getEvent }
];

// /v1/customers: create, retrieve, update, list (by email).
import type { ApiContext, Route } from './context';
import { noSuch } from './errors';
import { allowOnly, expandList, metadata, str } from './form';
import { newId, nowSeconds, randomToken } from './ids';
import { newestFirst } from './store';
import { applyExpand, paginate } from './render';
import type { Customer } from './types';

const CREATE = [
	'address',
	'balance',
	'business_name',
	'cash_balance',
	'description',
	'email',
	'expand',
	'individual_name',
	'invoice_prefix',
	'invoice_settings',
	'metadata',
	'name',
	'next_invoice_sequence',
	'payment_method',
	'phone',
	'preferred_locales',
	'shipping',
	'source',
	'tax',
	'tax_exempt',
	'tax_id_data',
	'test_clock',
	'validate'
];
const UPDATE = CREATE.filter(
	(p) => !['payment_method', 'tax_id_data', 'test_clock'].includes(p)
).concat('default_source');

function getCustomer(ctx: ApiContext): Customer {
	const customer = ctx.store.state.customers[ctx.ids[0]];
	if (!customer) throw noSuch('customer', ctx.ids[0]);
	return customer;
}

function create(ctx: ApiContext) {
	allowOnly(ctx.params, CREATE);
	const customer: Customer = {
		id: newId('cus'),
		object: 'customer',
		address: null,
		balance: 0,
		created: nowSeconds(),
		currency: null,
		default_source: null,
		delinquent: false,
		description: str(ctx.params, 'description') ?? null,
		email: str(ctx.params, 'email') ?? null,
		invoice_prefix: str(ctx.params, 'invoice_prefix') ?? randomToken(8).toUpperCase(),
		invoice_settings: {
			custom_fields: null,
			default_payment_method: null,
			footer: null,
			rendering_options: null
		},
		livemode: false,
		metadata: metadata(ctx.params),
		name: str(ctx.params, 'name') ?? null,
		phone: str(ctx.params, 'phone') ?? null,
		preferred_locales: [],
		shipping: null,
		tax_exempt: 'none',
		test_clock: null
	};
	ctx.store.state.customers[customer.id] = customer;
	ctx.events.emit('customer.created', customer, ctx.request);
	return { body: customer };
}

function update(ctx: ApiContext) {
	allowOnly(ctx.params, UPDATE);
	const customer = getCustomer(ctx);
	for (const field of ['description', 'email', 'name', 'phone'] as const) {
		if (ctx.params[field] !== undefined) customer[field] = str(ctx.params, field) ?? null;
	}
	customer.metadata = metadata(ctx.params, customer.metadata);
	ctx.events.emit('customer.updated', customer, ctx.request);
	return { body: customer };
}

function list(ctx: ApiContext) {
	allowOnly(ctx.params, [
		'created',
		'email',
		'expand',
		'test_clock',
		'limit',
		'starting_after',
		'ending_before'
	]);
	const email = str(ctx.params, 'email');
	const all = newestFirst(ctx.store.state.customers).filter((c) => !email || c.email === email);
	return { body: paginate(all, ctx.params, '/v1/customers') };
}

export const customerRoutes: Route[] = [
	{ method: 'POST', pattern: /^\/v1\/customers$/, handler: create },
	{ method: 'GET', pattern: /^\/v1\/customers$/, handler: list },
	{
		method: 'GET',
		pattern: /^\/v1\/customers\/([^/]+)$/,
		handler: (ctx) => ({
			body: applyExpand(ctx.store.state, getCustomer(ctx), expandList(ctx.params))
		})
	},
	{ method: 'POST', pattern: /^\/v1\/customers\/([^/]+)$/, handler: update }
];

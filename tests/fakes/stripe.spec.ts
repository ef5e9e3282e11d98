// The Stripe stand-in driven by the real `stripe` SDK, as the app will drive it.
import Stripe from 'stripe';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { startFakeStripe, type FakeStripe } from './stripe/server';
import {
	CARD_DECLINED,
	CARD_SUCCEEDS,
	payOnHostedPage,
	startWebhookListener,
	type WebhookListener
} from './stripe/testing';

const KEY = 'sk_test_fake_spec';
const SECRET = 'whsec_fake_spec_secret';

let fake: FakeStripe;
let hooks: WebhookListener;
let stripe: Stripe;

beforeAll(async () => {
	hooks = await startWebhookListener();
	fake = await startFakeStripe({
		port: 0,
		apiKey: KEY,
		webhookSecret: SECRET,
		webhookUrl: hooks.url,
		webhookRetryDelaysMs: [50, 50],
		accountName: 'Spec Hire Co'
	});
	stripe = new Stripe(KEY, { host: '127.0.0.1', port: fake.port, protocol: 'http' });
});

afterAll(async () => {
	await fake?.close();
	await hooks?.close();
});

beforeEach(async () => {
	await fetch(`${fake.url}/_fake/reset`, { method: 'POST' });
	hooks.received.length = 0;
});

/** An open invoice of 100.00 + 20.00 tax (as the app sends it: tax as its own line). */
async function openInvoice() {
	const customer = await stripe.customers.create({
		email: 'organiser@client.test',
		name: 'Client Org',
		metadata: { clientId: '42' }
	});
	const draft = await stripe.invoices.create({
		customer: customer.id,
		collection_method: 'send_invoice',
		days_until_due: 14,
		currency: 'gbp',
		description: 'Deposit for quote 17',
		metadata: { quoteId: '17', kind: 'deposit' },
		auto_advance: false,
		pending_invoice_items_behavior: 'exclude'
	});
	await stripe.invoiceItems.create({
		customer: customer.id,
		invoice: draft.id,
		amount: 10000,
		currency: 'gbp',
		description: 'Deposit (30%)',
		metadata: { quoteId: '17' }
	});
	await stripe.invoiceItems.create({
		customer: customer.id,
		invoice: draft.id,
		unit_amount_decimal: Stripe.Decimal.from('1000'),
		quantity: 2,
		currency: 'gbp',
		description: 'VAT 20%'
	});
	const invoice = await stripe.invoices.finalizeInvoice(draft.id);
	return { customer, draft, invoice };
}

describe('fake Stripe with the real SDK', () => {
	it('runs customer → items → invoice → finalize → hosted payment → signed invoice.paid webhook', async () => {
		const { customer, draft, invoice } = await openInvoice();
		expect(draft.status).toBe('draft');
		expect(invoice).toMatchObject({
			status: 'open',
			subtotal: 12000,
			total: 12000,
			amount_due: 12000,
			currency: 'gbp',
			customer: customer.id
		});
		expect(invoice.number).toMatch(/^[A-Z0-9]{8}-0001$/);
		expect(invoice.hosted_invoice_url).toBe(`${fake.url}/pay/${invoice.id}`);
		expect(invoice.lines.data.map((l) => l.amount)).toEqual([10000, 2000]);
		expect(invoice.due_date).toBe(invoice.created + 14 * 86400);

		const page = await (
			await fetch(`${invoice.hosted_invoice_url}?return=http://127.0.0.1:3100/client/invoices`)
		).text();
		expect(page).toContain('Local test stand-in');
		expect(page).toContain('Spec Hire Co');
		expect(page).toContain('£120.00');
		expect(page).toContain('name="card_number"');

		const paid = await payOnHostedPage(
			invoice.hosted_invoice_url!,
			CARD_SUCCEEDS,
			'http://127.0.0.1:3100/client/invoices'
		);
		expect(paid.status).toBe(303);
		const confirmation = await (await fetch(new URL(paid.location!, fake.url))).text();
		expect(confirmation).toContain('Paid — thank you');
		expect(confirmation).toContain('href="http://127.0.0.1:3100/client/invoices"');

		const after = await stripe.invoices.retrieve(invoice.id, { expand: ['payments'] });
		expect(after).toMatchObject({ status: 'paid', amount_paid: 12000, amount_remaining: 0 });
		expect(after.payments?.data[0].payment.payment_intent).toMatch(/^pi_/);
		expect(after.payments?.data[0].payment.charge).toMatch(/^ch_/);

		const hook = await hooks.waitFor('invoice.paid');
		const event = stripe.webhooks.constructEvent(hook.raw, hook.signature, SECRET);
		expect(event.type).toBe('invoice.paid');
		const object = event.data.object as Stripe.Invoice;
		expect(object).toMatchObject({
			id: invoice.id,
			status: 'paid',
			metadata: { quoteId: '17', kind: 'deposit' }
		});
		expect(event).toMatchObject({
			object: 'event',
			livemode: false,
			api_version: expect.any(String)
		});
		expect(() => stripe.webhooks.constructEvent(hook.raw, hook.signature, 'whsec_wrong')).toThrow(
			Stripe.errors.StripeSignatureVerificationError
		);
		await hooks.waitFor('invoice.payment_succeeded');
		expect(hooks.received.map((h) => h.type)).toEqual(
			expect.arrayContaining(['invoice.created', 'invoice.finalized'])
		);
	});

	it('declines the decline card: invoice stays open and invoice.payment_failed goes out; unknown cards are refused', async () => {
		const { invoice } = await openInvoice();
		const declined = await payOnHostedPage(invoice.hosted_invoice_url!, CARD_DECLINED);
		expect(declined.status).toBe(402);
		expect(declined.html).toContain('declined');
		const failed = stripe.webhooks.constructEvent(
			(await hooks.waitFor('invoice.payment_failed')).raw,
			hooks.received.find((h) => h.type === 'invoice.payment_failed')!.signature,
			SECRET
		);
		expect((failed.data.object as Stripe.Invoice).id).toBe(invoice.id);
		expect(await stripe.invoices.retrieve(invoice.id)).toMatchObject({
			status: 'open',
			attempt_count: 1,
			attempted: true
		});

		const unknown = await payOnHostedPage(invoice.hosted_invoice_url!, '5555 5555 5555 4444');
		expect(unknown.status).toBe(400);
		expect(unknown.html).toContain('not recognised by the test stand-in');

		expect((await payOnHostedPage(invoice.hosted_invoice_url!, CARD_SUCCEEDS)).status).toBe(303);
		expect((await stripe.invoices.retrieve(invoice.id)).status).toBe('paid');
		// A second payment of a paid invoice is refused.
		expect((await payOnHostedPage(invoice.hosted_invoice_url!, CARD_SUCCEEDS)).status).toBe(409);
	});

	it('voids an open invoice and refuses illegal transitions like Stripe', async () => {
		const { invoice } = await openInvoice();
		const voided = await stripe.invoices.voidInvoice(invoice.id);
		expect(voided.status).toBe('void');
		await hooks.waitFor('invoice.voided');
		await expect(stripe.invoices.voidInvoice(invoice.id)).rejects.toBeInstanceOf(
			Stripe.errors.StripeInvalidRequestError
		);
		await expect(stripe.invoices.pay(invoice.id)).rejects.toMatchObject({
			statusCode: 400,
			type: 'StripeInvalidRequestError'
		});
		const refinalize = await stripe.invoices.finalizeInvoice(invoice.id).catch((e: unknown) => e);
		expect(refinalize).toMatchObject({ statusCode: 400, code: 'invoice_not_editable' });
		expect(await (await fetch(invoice.hosted_invoice_url!)).text()).toContain('cancelled');
		await expect(
			stripe.invoiceItems.create({
				customer: invoice.customer as string,
				invoice: invoice.id,
				amount: 5,
				currency: 'gbp'
			})
		).rejects.toMatchObject({ code: 'invoice_not_editable' });
	});

	it('pays through the API, refunds partially and refuses an over-refund', async () => {
		const { invoice } = await openInvoice();
		// `charge` and `payment_intent` are the legacy invoice fields the stand-in still returns (not in the SDK's types).
		const paid = (await stripe.invoices.pay(invoice.id)) as unknown as Stripe.Invoice & {
			charge: string;
			payment_intent: string;
		};
		expect(paid.status).toBe('paid');
		expect(paid.charge).toMatch(/^ch_/);

		const refund = await stripe.refunds.create({
			charge: paid.charge,
			amount: 5000,
			reason: 'requested_by_customer',
			metadata: { bookingId: '9' }
		});
		expect(refund).toMatchObject({
			object: 'refund',
			amount: 5000,
			status: 'succeeded',
			charge: paid.charge,
			payment_intent: paid.payment_intent
		});
		const over = await stripe.refunds
			.create({ payment_intent: paid.payment_intent, amount: 7001 })
			.catch((e: unknown) => e);
		expect(over).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
		expect(over).toMatchObject({ statusCode: 400, code: 'amount_too_large', param: 'amount' });
		const rest = await stripe.refunds.create({ payment_intent: paid.payment_intent });
		expect(rest.amount).toBe(7000);
		await expect(stripe.refunds.create({ charge: paid.charge, amount: 1 })).rejects.toMatchObject({
			code: 'charge_already_refunded'
		});

		const hook = await hooks.waitFor('charge.refunded');
		const charge = stripe.webhooks.constructEvent(hook.raw, hook.signature, SECRET).data
			.object as Stripe.Charge;
		expect(charge).toMatchObject({ id: paid.charge, amount_refunded: 5000, refunded: false });
		expect(await stripe.charges.retrieve(paid.charge)).toMatchObject({
			amount_refunded: 12000,
			refunded: true
		});
	});

	it('answers a declined API payment with a card error', async () => {
		const { invoice } = await openInvoice();
		const err = await stripe.invoices
			.pay(invoice.id, { payment_method: 'pm_card_chargeDeclined' })
			.catch((e: unknown) => e);
		expect(err).toBeInstanceOf(Stripe.errors.StripeCardError);
		expect(err).toMatchObject({
			statusCode: 402,
			code: 'card_declined',
			decline_code: 'generic_decline'
		});
		expect((await stripe.invoices.retrieve(invoice.id)).status).toBe('open');
	});

	it('lists invoices by customer, newest first, and marks a zero invoice paid at finalization', async () => {
		const { customer, invoice } = await openInvoice();
		const zero = await stripe.invoices.create({
			customer: customer.id,
			collection_method: 'send_invoice',
			days_until_due: 1,
			currency: 'gbp'
		});
		expect((await stripe.invoices.finalizeInvoice(zero.id)).status).toBe('paid');
		const other = await stripe.customers.create({ email: 'someone@else.test' });
		await stripe.invoices.create({
			customer: other.id,
			collection_method: 'send_invoice',
			days_until_due: 1,
			currency: 'gbp'
		});
		const list = await stripe.invoices.list({ customer: customer.id });
		expect(list.data.map((i) => i.id)).toEqual([zero.id, invoice.id]);
		expect((await stripe.customers.retrieve(customer.id)) as Stripe.Customer).toMatchObject({
			email: 'organiser@client.test',
			metadata: { clientId: '42' }
		});
	});

	it('rejects missing and unknown parameters and unknown ids with Stripe errors', async () => {
		await expect(stripe.invoices.create({} as Stripe.InvoiceCreateParams)).rejects.toMatchObject({
			code: 'parameter_missing',
			param: 'customer'
		});
		await expect(
			stripe.customers.create({ emial: 'x' } as unknown as Stripe.CustomerCreateParams)
		).rejects.toMatchObject({ code: 'parameter_unknown', param: 'emial' });
		const missing = await stripe.invoices.retrieve('in_nothing').catch((e: unknown) => e);
		expect(missing).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
		expect(missing).toMatchObject({
			statusCode: 404,
			code: 'resource_missing',
			message: "No such invoice: 'in_nothing'"
		});
	});
});

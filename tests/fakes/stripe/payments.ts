// Paying an invoice (from the hosted page or POST /v1/invoices/:id/pay) and refunding the charge.
// One PaymentIntent per invoice, one Charge per attempt, as on Stripe.
import type { Deps } from './context';
import { FakeStripeError, invalid, noSuch } from './errors';
import { newId, nowSeconds } from './ids';
import { emitInvoice, requireStatus } from './invoice-logic';
import type { Charge, Invoice, PaymentIntent, Refund } from './types';

export interface CardDetails {
	brand: string;
	last4: string;
	exp_month: number;
	exp_year: number;
}

export const TEST_CARD: CardDetails = {
	brand: 'visa',
	last4: '4242',
	exp_month: 12,
	exp_year: new Date().getFullYear() + 3
};

export function declinedError(charge: Charge): FakeStripeError {
	return new FakeStripeError(
		402,
		'card_error',
		'Your card was declined.',
		'card_declined',
		undefined,
		{
			decline_code: 'generic_decline',
			charge: charge.id,
			payment_intent: {
				id: charge.payment_intent,
				object: 'payment_intent',
				status: 'requires_payment_method'
			}
		}
	);
}

function intentFor(deps: Deps, invoice: Invoice): PaymentIntent {
	const state = deps.store.state;
	if (invoice.payment_intent && state.paymentIntents[invoice.payment_intent])
		return state.paymentIntents[invoice.payment_intent];
	const intent: PaymentIntent = {
		id: newId('pi'),
		object: 'payment_intent',
		amount: invoice.amount_remaining,
		amount_received: 0,
		created: nowSeconds(),
		currency: invoice.currency,
		customer: invoice.customer,
		description: `Payment for Invoice ${invoice.number ?? invoice.id}`,
		last_payment_error: null,
		latest_charge: null,
		livemode: false,
		metadata: {},
		payment_method_types: ['card'],
		status: 'requires_payment_method'
	};
	state.paymentIntents[intent.id] = intent;
	invoice.payment_intent = intent.id;
	const paymentId = newId('inpay');
	state.invoicePayments[paymentId] = {
		id: paymentId,
		object: 'invoice_payment',
		amount_paid: null,
		amount_requested: invoice.amount_remaining,
		created: intent.created,
		currency: invoice.currency,
		invoice: invoice.id,
		is_default: true,
		livemode: false,
		payment: { type: 'payment_intent', payment_intent: intent.id },
		status: 'open',
		status_transitions: { canceled_at: null, paid_at: null }
	};
	invoice.payment_ids.push(paymentId);
	return intent;
}

/** Charges the invoice's remaining amount; a decline leaves it open and returns the card error. */
export function chargeInvoice(
	deps: Deps,
	invoice: Invoice,
	card: CardDetails,
	declined: boolean
): { ok: true } | { ok: false; error: FakeStripeError } {
	requireStatus(invoice, 'pay');
	const state = deps.store.state;
	const intent = intentFor(deps, invoice);
	const now = nowSeconds();
	const charge: Charge = {
		id: newId('ch'),
		object: 'charge',
		amount: invoice.amount_remaining,
		amount_captured: declined ? 0 : invoice.amount_remaining,
		amount_refunded: 0,
		captured: !declined,
		created: now,
		currency: invoice.currency,
		customer: invoice.customer,
		description: intent.description,
		failure_code: declined ? 'card_declined' : null,
		failure_message: declined ? 'Your card was declined.' : null,
		livemode: false,
		metadata: {},
		outcome: declined
			? {
					network_status: 'declined_by_network',
					reason: 'generic_decline',
					risk_level: 'normal',
					seller_message: 'The bank did not return any further details with this decline.',
					type: 'issuer_declined'
				}
			: {
					network_status: 'approved_by_network',
					reason: null,
					risk_level: 'normal',
					seller_message: 'Payment complete.',
					type: 'authorized'
				},
		paid: !declined,
		payment_intent: intent.id,
		payment_method_details: { type: 'card', card },
		receipt_url: null,
		refunded: false,
		status: declined ? 'failed' : 'succeeded'
	};
	state.charges[charge.id] = charge;
	intent.latest_charge = charge.id;
	invoice.attempt_count += 1;
	invoice.attempted = true;

	if (declined) {
		const error = declinedError(charge);
		intent.last_payment_error = { ...error.toBody().error };
		emitInvoice(deps, 'invoice.payment_failed', invoice);
		return { ok: false, error };
	}

	intent.status = 'succeeded';
	intent.amount_received = charge.amount;
	intent.last_payment_error = null;
	const payment = state.invoicePayments[invoice.payment_ids[invoice.payment_ids.length - 1]];
	Object.assign(payment, {
		amount_paid: charge.amount,
		status: 'paid',
		status_transitions: { canceled_at: null, paid_at: now }
	});
	payment.payment.charge = charge.id;
	markPaid(deps, invoice, charge.amount, charge.id);
	return { ok: true };
}

/** `paid_out_of_band` or a successful charge: the invoice is paid and both paid events go out. */
export function markPaid(
	deps: Deps,
	invoice: Invoice,
	amount: number,
	chargeId: string | null
): void {
	const previous = invoice.status;
	invoice.status = 'paid';
	invoice.amount_paid += amount;
	invoice.amount_remaining = 0;
	invoice.charge = chargeId;
	invoice.status_transitions.paid_at = nowSeconds();
	invoice.next_payment_attempt = null;
	emitInvoice(deps, 'invoice.paid', invoice, { status: previous });
	emitInvoice(deps, 'invoice.payment_succeeded', invoice);
}

export function createRefund(
	deps: Deps,
	input: {
		charge?: string;
		payment_intent?: string;
		amount?: number;
		reason?: string;
		metadata: Record<string, string>;
	}
): Refund {
	const state = deps.store.state;
	let charge: Charge | undefined;
	if (input.charge) {
		charge = state.charges[input.charge];
		if (!charge) throw noSuch('charge', input.charge, 'charge');
	} else if (input.payment_intent) {
		const intent = state.paymentIntents[input.payment_intent];
		if (!intent) throw noSuch('payment_intent', input.payment_intent, 'payment_intent');
		charge = intent.latest_charge ? state.charges[intent.latest_charge] : undefined;
		if (!charge || intent.status !== 'succeeded') {
			throw invalid(
				`This PaymentIntent (${intent.id}) does not have a successful charge to refund.`,
				'charge_not_refundable',
				'payment_intent'
			);
		}
	} else {
		throw invalid(
			'One of the following params should be provided for this request: payment_intent or charge.',
			'parameter_missing'
		);
	}
	if (charge.status !== 'succeeded')
		throw invalid(
			`Charge ${charge.id} has not succeeded and cannot be refunded.`,
			'charge_not_refundable',
			'charge'
		);
	const refundable = charge.amount_captured - charge.amount_refunded;
	if (refundable <= 0)
		throw invalid(`Charge ${charge.id} has already been refunded.`, 'charge_already_refunded');
	const amount = input.amount ?? refundable;
	if (amount <= 0)
		throw invalid(
			'Refund amount must be a positive integer.',
			'parameter_invalid_integer',
			'amount'
		);
	if (amount > refundable) {
		throw invalid(
			`Refund amount (${amount}) is greater than unrefunded amount on charge (${refundable})`,
			'amount_too_large',
			'amount'
		);
	}
	const refund: Refund = {
		id: newId('re'),
		object: 'refund',
		amount,
		balance_transaction: null,
		charge: charge.id,
		created: nowSeconds(),
		currency: charge.currency,
		metadata: input.metadata,
		payment_intent: charge.payment_intent,
		reason: input.reason ?? null,
		receipt_number: null,
		status: 'succeeded'
	};
	state.refunds[refund.id] = refund;
	const before = charge.amount_refunded;
	charge.amount_refunded += amount;
	charge.refunded = charge.amount_refunded >= charge.amount_captured;
	deps.events.emit('refund.created', refund, deps.request);
	deps.events.emit('charge.refunded', charge, deps.request, {
		amount_refunded: before,
		refunded: false
	});
	return refund;
}

import { error, json } from '@sveltejs/kit';
import type Stripe from 'stripe';
import { stripe, webhookSecret } from '$lib/server/payments/stripe-client';
import { applyStripeEvent } from '$lib/server/services/payment-events';
import { signedTooFarAhead } from '$lib/payments/webhook-signature';
import type { RequestHandler } from './$types';

/**
 * Stripe's signed events. No session: the signature over the raw body is the authentication,
 * checked before anything is read. A bad or missing signature is 400 and changes nothing.
 */
export const POST: RequestHandler = async ({ request }) => {
	const signature = request.headers.get('stripe-signature');
	if (!signature) error(400, { message: 'Missing Stripe-Signature header.' });
	const body = await request.text();
	let event: Stripe.Event;
	try {
		event = stripe().webhooks.constructEvent(body, signature, webhookSecret());
	} catch {
		error(400, { message: 'The signature does not match this body.' });
	}
	if (signedTooFarAhead(signature, Math.floor(Date.now() / 1000))) {
		error(400, { message: 'The signature is dated in the future.' });
	}
	const { status, outcome } = await applyStripeEvent(event);
	return json({ received: true, outcome }, { status });
};

import { env } from '$env/dynamic/private';
import Stripe from 'stripe';

const cache = globalThis as unknown as { throwlineStripe?: Stripe };

/**
 * The Stripe SDK, pointed by configuration at the API (the local stand-in in development and tests).
 * Short timeout and one retry: a payment service that does not answer becomes a clear message fast.
 */
export function stripe(): Stripe {
	if (!cache.throwlineStripe) {
		if (!env.STRIPE_SECRET_KEY) throw new Error('STRIPE_SECRET_KEY is not set (see .env.example)');
		cache.throwlineStripe = new Stripe(env.STRIPE_SECRET_KEY, {
			host: env.STRIPE_API_HOST || undefined,
			port: env.STRIPE_API_PORT ? Number(env.STRIPE_API_PORT) : undefined,
			protocol: env.STRIPE_API_HOST ? 'http' : 'https',
			maxNetworkRetries: 1,
			timeout: 8000
		});
	}
	return cache.throwlineStripe;
}

export function webhookSecret(): string {
	if (!env.STRIPE_WEBHOOK_SECRET) throw new Error('STRIPE_WEBHOOK_SECRET is not set (see .env.example)');
	return env.STRIPE_WEBHOOK_SECRET;
}

/** True for errors that mean "the payment service is down or slow", as opposed to a refusal. */
export function isPaymentServiceDown(err: unknown): boolean {
	const type = (err as { type?: string })?.type;
	return type === 'StripeConnectionError' || type === 'StripeAPIError' || (err as { statusCode?: number })?.statusCode === 500;
}

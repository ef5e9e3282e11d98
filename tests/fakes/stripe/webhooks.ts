// Webhook signing and delivery exactly as Stripe does it: POST of the raw JSON with
// `Stripe-Signature: t=<unix>,v1=<hex HMAC-SHA256 of "<t>.<body>" keyed by the endpoint secret>`.
import { createHmac } from 'node:crypto';
import type { DeliveryAttempt } from './types';

export function signatureHeader(
	payload: string,
	secret: string,
	timestamp = Math.floor(Date.now() / 1000)
): string {
	const signature = createHmac('sha256', secret)
		.update(`${timestamp}.${payload}`, 'utf8')
		.digest('hex');
	return `t=${timestamp},v1=${signature}`;
}

/** One POST of a signed payload; never throws, the outcome is recorded as an attempt. */
export async function postWebhook(
	url: string,
	payload: string,
	secret: string,
	attempt: number,
	timeoutMs = 10_000
): Promise<DeliveryAttempt> {
	const started = Date.now();
	const at = new Date(started).toISOString();
	try {
		const res = await fetch(url, {
			method: 'POST',
			headers: {
				'content-type': 'application/json; charset=utf-8',
				'user-agent': 'Stripe/1.0 (+https://stripe.com/docs/webhooks)',
				'stripe-signature': signatureHeader(payload, secret)
			},
			body: payload,
			signal: AbortSignal.timeout(timeoutMs)
		});
		await res.arrayBuffer().catch(() => undefined);
		return {
			attempt,
			at,
			url,
			status: res.status,
			ok: res.ok,
			error: null,
			durationMs: Date.now() - started
		};
	} catch (err) {
		const message =
			err instanceof Error
				? err.cause instanceof Error
					? err.cause.message
					: err.message
				: String(err);
		return {
			attempt,
			at,
			url,
			status: null,
			ok: false,
			error: message,
			durationMs: Date.now() - started
		};
	}
}

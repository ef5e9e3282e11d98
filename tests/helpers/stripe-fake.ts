/** Reaching the Stripe stand-in the test world started (scripts/test-env.sh ports). */
import type Stripe from 'stripe';

export const FAKE_STRIPE = `http://127.0.0.1:${process.env.STRIPE_API_PORT ?? 12211}`;

export async function fakeEvents(type?: string): Promise<Stripe.Event[]> {
	const response = await fetch(`${FAKE_STRIPE}/_fake/events${type ? `?type=${type}` : ''}`);
	const body = (await response.json()) as Stripe.Event[] | { data: Stripe.Event[] };
	return Array.isArray(body) ? body : body.data;
}

/** The newest event of a type about one invoice. */
export async function eventFor(type: string, invoiceId: string): Promise<Stripe.Event> {
	for (let i = 0; i < 50; i++) {
		const hit = (await fakeEvents(type)).find((e) => (e.data.object as { id?: string; invoice?: string }).id === invoiceId);
		if (hit) return hit;
		await new Promise((r) => setTimeout(r, 50));
	}
	throw new Error(`no ${type} event for ${invoiceId}`);
}

export async function fakeConfig(config: Record<string, unknown>): Promise<void> {
	await fetch(`${FAKE_STRIPE}/_fake/config`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(config) });
}

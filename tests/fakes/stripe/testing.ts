// Helpers for tests that drive the Stripe stand-in: a local webhook receiver and a scripted payment
// on the hosted invoice page (the same form POST a browser would make).
import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';

export interface ReceivedWebhook {
	raw: string;
	signature: string;
	type: string;
	id: string;
}

export interface WebhookListener {
	url: string;
	received: ReceivedWebhook[];
	/** Status codes to answer with, in order; 200 once exhausted. */
	respondWith: number[];
	waitFor(type: string, timeoutMs?: number): Promise<ReceivedWebhook>;
	close(): Promise<void>;
}

export async function startWebhookListener(): Promise<WebhookListener> {
	const received: ReceivedWebhook[] = [];
	const respondWith: number[] = [];
	const server: Server = createServer((req, res) => {
		const chunks: Buffer[] = [];
		req.on('data', (c: Buffer) => chunks.push(c));
		req.on('end', () => {
			const raw = Buffer.concat(chunks).toString('utf8');
			const status = listener.respondWith.shift() ?? 200;
			if (status < 300) {
				const event = JSON.parse(raw) as { id: string; type: string };
				received.push({
					raw,
					signature: String(req.headers['stripe-signature'] ?? ''),
					type: event.type,
					id: event.id
				});
			}
			res.writeHead(status, { 'content-type': 'application/json' });
			res.end(JSON.stringify({ received: status < 300 }));
		});
	});
	await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', () => resolve()));
	const listener: WebhookListener = {
		url: `http://127.0.0.1:${(server.address() as AddressInfo).port}/api/webhooks/stripe`,
		received,
		respondWith,
		async waitFor(type, timeoutMs = 5000) {
			const deadline = Date.now() + timeoutMs;
			for (;;) {
				const hit = received.find((w) => w.type === type);
				if (hit) return hit;
				if (Date.now() > deadline)
					throw new Error(
						`no ${type} webhook within ${timeoutMs} ms (got: ${received.map((w) => w.type).join(', ') || 'none'})`
					);
				await new Promise((r) => setTimeout(r, 25));
			}
		},
		async close() {
			server.closeAllConnections();
			await new Promise<void>((resolve) => server.close(() => resolve()));
		}
	};
	return listener;
}

export const CARD_SUCCEEDS = '4242 4242 4242 4242';
export const CARD_DECLINED = '4000 0000 0000 0002';

/** Submits the hosted page's card form; answers the status and the page (303 on success). */
export async function payOnHostedPage(
	hostedInvoiceUrl: string,
	cardNumber: string,
	returnUrl?: string
): Promise<{ status: number; html: string; location: string | null }> {
	const body = new URLSearchParams({
		card_number: cardNumber,
		expiry: '12/40',
		cvc: '123',
		return: returnUrl ?? ''
	});
	const res = await fetch(hostedInvoiceUrl, { method: 'POST', body, redirect: 'manual' });
	return { status: res.status, html: await res.text(), location: res.headers.get('location') };
}

// Starts the fake Stripe on loopback: /v1 API, hosted invoice pages under /pay, test controls under /_fake.
import { createServer, type IncomingMessage } from 'node:http';
import type { AddressInfo } from 'node:net';
import { handleApi, type Faults } from './api';
import { handleControl } from './control';
import { EventBus } from './events';
import { handleHostedPage } from './hosted-page';
import { Store } from './store';

export interface FakeStripeOptions {
	host?: string;
	/** 0 picks a free port. */
	port?: number;
	/** The one secret key accepted; omit to accept any `sk_test_` key. */
	apiKey?: string;
	webhookSecret: string;
	/** Where events are POSTed; empty string records events without delivering them. */
	webhookUrl: string;
	/** Delays before each retry of a failed delivery (default 1 s, 3 s, 9 s: four attempts in all). */
	webhookRetryDelaysMs?: number[];
	/** Shown as the company on the hosted invoice page and as `account_name`. */
	accountName?: string;
	/** JSON file that keeps the state across restarts; omit for memory only. */
	statePath?: string;
}

export interface FakeStripe {
	url: string;
	port: number;
	store: Store;
	events: EventBus;
	faults: Faults;
	close(): Promise<void>;
}

const MAX_BODY = 1024 * 1024;

function readBody(req: IncomingMessage): Promise<string> {
	return new Promise((resolve, reject) => {
		const chunks: Buffer[] = [];
		let size = 0;
		req.on('data', (chunk: Buffer) => {
			size += chunk.length;
			if (size > MAX_BODY) {
				reject(new Error('Request body too large'));
				req.destroy();
				return;
			}
			chunks.push(chunk);
		});
		req.on('end', () => resolve(Buffer.concat(chunks).toString('utf8')));
		req.on('error', reject);
	});
}

export async function startFakeStripe(options: FakeStripeOptions): Promise<FakeStripe> {
	const host = options.host ?? '127.0.0.1';
	const store = new Store(options.statePath);
	const events = new EventBus(store, {
		url: options.webhookUrl,
		secret: options.webhookSecret,
		retryDelaysMs: options.webhookRetryDelaysMs ?? [1000, 3000, 9000]
	});
	const faults: Faults = { failNext: 0, delayMs: 0 };
	const accountName = options.accountName ?? 'Local test account';
	let baseUrl = '';

	const server = createServer((req, res) => {
		const url = new URL(req.url ?? '/', 'http://127.0.0.1');
		readBody(req)
			.then(async (body) => {
				if (url.pathname.startsWith('/v1/')) {
					await handleApi(
						{ store, events, faults, baseUrl, accountName, apiKey: options.apiKey ?? null },
						req,
						res,
						url,
						body
					);
				} else if (url.pathname.startsWith('/pay/')) {
					handleHostedPage(
						{ store, events, baseUrl, accountName, request: { id: null, idempotency_key: null } },
						req,
						res,
						url,
						body
					);
				} else if (url.pathname.startsWith('/_fake/')) {
					await handleControl({ store, events, faults }, req.method ?? 'GET', url, body, res);
				} else {
					res.writeHead(404, { 'content-type': 'text/plain' });
					res.end(
						'Local Stripe stand-in: /v1/* API, /pay/:invoice hosted pages, /_fake/* test controls.\n'
					);
				}
			})
			.catch((err: unknown) => {
				if (res.headersSent) return res.destroy();
				res.writeHead(500, { 'content-type': 'application/json' });
				res.end(
					JSON.stringify({
						error: { type: 'api_error', message: err instanceof Error ? err.message : String(err) }
					})
				);
			});
	});

	await new Promise<void>((resolve, reject) => {
		server.once('error', reject);
		server.listen(options.port ?? 12111, host, () => resolve());
	});
	const port = (server.address() as AddressInfo).port;
	baseUrl = `http://${host}:${port}`;

	return {
		url: baseUrl,
		port,
		store,
		events,
		faults,
		async close() {
			events.close();
			store.flush();
			server.closeAllConnections();
			await new Promise<void>((resolve) => server.close(() => resolve()));
		}
	};
}

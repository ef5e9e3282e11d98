// The /v1 API: simulated outage and latency, API-key check, form decoding, routing, idempotent
// replays, and Stripe's error envelope. Every response carries a Request-Id like Stripe's.
import type { IncomingMessage, ServerResponse } from 'node:http';
import type { Deps, Route } from './context';
import { API_VERSION, type EventBus } from './events';
import { authError, FakeStripeError, unrecognizedUrl } from './errors';
import { parseForm, type Params } from './form';
import { randomToken } from './ids';
import { customerRoutes } from './routes-customers';
import { invoiceItemRoutes } from './routes-invoice-items';
import { invoiceRoutes } from './routes-invoices';
import { paymentRoutes } from './routes-payments';
import type { Store } from './store';

const ROUTES: Route[] = [
	...customerRoutes,
	...invoiceItemRoutes,
	...invoiceRoutes,
	...paymentRoutes
];
const IDEMPOTENCY_KEYS_KEPT = 2000;

/** Test-only fault injection, set through POST /_fake/config. */
export interface Faults {
	/** Answer the next n API calls with a 500 api_error. */
	failNext: number;
	/** Wait this long before answering each API call. */
	delayMs: number;
}

export interface ApiEnv {
	store: Store;
	events: EventBus;
	faults: Faults;
	baseUrl: string;
	accountName: string;
	/** The one accepted secret key; null accepts any `sk_test_` key. */
	apiKey: string | null;
}

function send(
	res: ServerResponse,
	status: number,
	body: unknown,
	headers: Record<string, string>
): void {
	res.writeHead(status, { 'content-type': 'application/json', ...headers });
	res.end(JSON.stringify(body, null, 2));
}

function presentedKey(req: IncomingMessage): string | null {
	const header = req.headers.authorization ?? '';
	const bearer = /^Bearer\s+(\S+)$/i.exec(header);
	if (bearer) return bearer[1];
	const basic = /^Basic\s+(\S+)$/i.exec(header);
	if (basic) return Buffer.from(basic[1], 'base64').toString('utf8').split(':')[0] || null;
	return null;
}

function checkKey(env: ApiEnv, key: string | null): void {
	if (!key) {
		throw authError(
			"You did not provide an API key. You need to provide your API key in the Authorization header, using Bearer auth (e.g. 'Authorization: Bearer YOUR_SECRET_KEY')."
		);
	}
	if (!key.startsWith('sk_test_') || (env.apiKey !== null && key !== env.apiKey)) {
		throw authError(
			`Invalid API Key provided: ${key.slice(0, 8)}${'*'.repeat(Math.max(0, key.length - 12))}${key.slice(-4)}`
		);
	}
}

function match(method: string, path: string): { route: Route; ids: string[] } | null {
	for (const route of ROUTES) {
		if (route.method !== method) continue;
		const m = route.pattern.exec(path);
		if (m) return { route, ids: m.slice(1).map(decodeURIComponent) };
	}
	return null;
}

export async function handleApi(
	env: ApiEnv,
	req: IncomingMessage,
	res: ServerResponse,
	url: URL,
	body: string
): Promise<void> {
	const requestId = `req_${randomToken(14)}`;
	const method = req.method ?? 'GET';
	const idempotencyKey =
		method === 'POST' ? ((req.headers['idempotency-key'] as string | undefined) ?? null) : null;
	const headers: Record<string, string> = {
		'request-id': requestId,
		'stripe-version': (req.headers['stripe-version'] as string | undefined) ?? API_VERSION,
		...(idempotencyKey ? { 'idempotency-key': idempotencyKey } : {})
	};
	if (env.faults.delayMs > 0) await new Promise((r) => setTimeout(r, env.faults.delayMs));
	if (env.faults.failNext > 0) {
		env.faults.failNext -= 1;
		send(
			res,
			500,
			{
				error: {
					type: 'api_error',
					message:
						'Simulated outage: the local Stripe stand-in was told to fail this request (failNext).'
				}
			},
			headers
		);
		return;
	}

	let status = 200;
	let payload: unknown;
	const key = presentedKey(req);
	const cacheKey = idempotencyKey ? `${key}:${idempotencyKey}` : null;
	const fingerprint = `${method} ${url.pathname} ${body}`;
	try {
		checkKey(env, key);
		const cached = cacheKey ? env.store.state.idempotency[cacheKey] : undefined;
		if (cached) {
			if (cached.fingerprint !== fingerprint) {
				throw new FakeStripeError(
					400,
					'idempotency_error',
					`Keys for idempotent requests can only be used with the same parameters they were first used with. Try using a key other than '${idempotencyKey}' if you meant to execute a different request.`
				);
			}
			send(res, cached.status, cached.body, { ...headers, 'idempotent-replayed': 'true' });
			return;
		}
		const found = match(method, url.pathname);
		if (!found) throw unrecognizedUrl(method, url.pathname);
		const params: Params = method === 'POST' ? parseForm(body) : parseForm(url.search.slice(1));
		const deps: Deps = {
			store: env.store,
			events: env.events,
			request: { id: requestId, idempotency_key: idempotencyKey },
			baseUrl: env.baseUrl,
			accountName: env.accountName
		};
		const result = found.route.handler({ ...deps, params, ids: found.ids });
		status = result.status ?? 200;
		payload = result.body;
	} catch (err) {
		const error =
			err instanceof FakeStripeError
				? err
				: new FakeStripeError(500, 'api_error', err instanceof Error ? err.message : String(err));
		status = error.status;
		payload = error.toBody();
	}
	// Like Stripe, replay only requests that ran (successes and card declines), not refusals.
	if (cacheKey && (status < 300 || status === 402))
		rememberResponse(env.store, cacheKey, { fingerprint, status, body: payload });
	env.store.save();
	send(res, status, payload, headers);
}

function rememberResponse(
	store: Store,
	cacheKey: string,
	entry: { fingerprint: string; status: number; body: unknown }
): void {
	const cache = store.state.idempotency;
	cache[cacheKey] = entry;
	const keys = Object.keys(cache);
	for (const old of keys.slice(0, Math.max(0, keys.length - IDEMPOTENCY_KEYS_KEPT)))
		delete cache[old];
}

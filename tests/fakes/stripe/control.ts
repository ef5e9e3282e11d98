// Test-only controls under /_fake (no API key; the fake listens on loopback only):
//   GET  /_fake/health                 → { ok: true }
//   GET  /_fake/events[?type=]         → every event, newest first, each with its `delivery` record
//   POST /_fake/events/:id/resend      → delivers that event again (replay); answers the attempt
//   POST /_fake/reset                  → forgets all objects and events, clears the faults
//   GET|POST /_fake/config             → { failNext, delayMs, webhookUrl, webhookRetryDelaysMs }
import type { ServerResponse } from 'node:http';
import type { Faults } from './api';
import type { EventBus } from './events';
import { newestFirst, type Store } from './store';

export interface ControlEnv {
	store: Store;
	events: EventBus;
	faults: Faults;
}

function json(res: ServerResponse, status: number, body: unknown): void {
	res.writeHead(status, { 'content-type': 'application/json' });
	res.end(JSON.stringify(body, null, 2));
}

function config(env: ControlEnv) {
	return {
		failNext: env.faults.failNext,
		delayMs: env.faults.delayMs,
		webhookUrl: env.events.webhook.url,
		webhookRetryDelaysMs: env.events.webhook.retryDelaysMs
	};
}

function readBody(raw: string): Record<string, unknown> {
	if (!raw.trim()) return {};
	if (raw.trim().startsWith('{')) return JSON.parse(raw) as Record<string, unknown>;
	return Object.fromEntries(new URLSearchParams(raw));
}

function nonNegative(value: unknown, name: string): number {
	const n = Number(value);
	if (!Number.isInteger(n) || n < 0) throw new Error(`${name} must be a non-negative integer`);
	return n;
}

function applyConfig(env: ControlEnv, body: Record<string, unknown>): void {
	if (body.failNext !== undefined) env.faults.failNext = nonNegative(body.failNext, 'failNext');
	if (body.delayMs !== undefined) env.faults.delayMs = nonNegative(body.delayMs, 'delayMs');
	if (body.webhookUrl !== undefined) env.events.webhook.url = String(body.webhookUrl);
	if (body.webhookRetryDelaysMs !== undefined) {
		const list = Array.isArray(body.webhookRetryDelaysMs)
			? body.webhookRetryDelaysMs
			: String(body.webhookRetryDelaysMs).split(',');
		env.events.webhook.retryDelaysMs = list
			.slice(0, 10)
			.map((v) => nonNegative(v, 'webhookRetryDelaysMs'));
	}
}

export async function handleControl(
	env: ControlEnv,
	method: string,
	url: URL,
	body: string,
	res: ServerResponse
): Promise<void> {
	const path = url.pathname;
	try {
		if (method === 'GET' && path === '/_fake/health') return json(res, 200, { ok: true });
		if (method === 'GET' && path === '/_fake/config') return json(res, 200, config(env));
		if (method === 'POST' && path === '/_fake/config') {
			applyConfig(env, readBody(body));
			return json(res, 200, config(env));
		}
		if (method === 'POST' && path === '/_fake/reset') {
			env.events.close();
			env.store.reset();
			env.faults.failNext = 0;
			env.faults.delayMs = 0;
			return json(res, 200, { ok: true });
		}
		if (method === 'GET' && path === '/_fake/events') {
			const type = url.searchParams.get('type');
			const data = newestFirst(env.store.state.events)
				.filter((r) => !type || r.event.type === type)
				.map((r) => ({ ...r.event, delivery: r.delivery }));
			return json(res, 200, { object: 'list', data });
		}
		const resend = /^\/_fake\/events\/([^/]+)\/resend$/.exec(path);
		if (method === 'POST' && resend) {
			const record = env.store.state.events[resend[1]];
			if (!record)
				return json(res, 404, {
					error: { type: 'invalid_request_error', message: `No such event: '${resend[1]}'` }
				});
			if (!env.events.webhook.url)
				return json(res, 409, {
					error: { type: 'invalid_request_error', message: 'No webhook URL is configured.' }
				});
			const attempt = await env.events.resend(record);
			return json(res, 200, { id: record.event.id, attempt, delivery: record.delivery });
		}
		json(res, 404, {
			error: { type: 'invalid_request_error', message: `Unknown test control: ${method} ${path}` }
		});
	} catch (err) {
		json(res, 400, {
			error: {
				type: 'invalid_request_error',
				message: err instanceof Error ? err.message : String(err)
			}
		});
	}
}

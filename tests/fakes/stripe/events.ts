// Records events with Stripe's event shape and delivers each to the webhook URL, retrying a failed
// delivery a bounded number of times with growing delays (Stripe retries for days; a test cannot wait).
import { newId, nowSeconds } from './ids';
import type { Store } from './store';
import type { DeliveryAttempt, EventRecord, StripeEvent } from './types';
import { postWebhook } from './webhooks';

/** The API version of the bundled SDK (stripe@23), so events look like those the app's SDK expects. */
export const API_VERSION = '2026-10-28.endive';

export interface WebhookSettings {
	/** Empty string: record events but deliver nothing. */
	url: string;
	secret: string;
	/** Delays before the 2nd, 3rd… attempt; the number of entries bounds the retries. */
	retryDelaysMs: number[];
}

export interface RequestInfo {
	id: string | null;
	idempotency_key: string | null;
}

export class EventBus {
	private readonly timers = new Set<NodeJS.Timeout>();

	constructor(
		private readonly store: Store,
		readonly webhook: WebhookSettings
	) {}

	emit(
		type: string,
		object: unknown,
		request: RequestInfo,
		previous?: Record<string, unknown>
	): EventRecord {
		const event: StripeEvent = {
			id: newId('evt'),
			object: 'event',
			api_version: API_VERSION,
			created: nowSeconds(),
			// A snapshot: later changes to the object must not alter an event already recorded.
			data: {
				object: structuredClone(object),
				...(previous ? { previous_attributes: previous } : {})
			},
			livemode: false,
			pending_webhooks: this.webhook.url ? 1 : 0,
			request,
			type
		};
		const record: EventRecord = {
			event,
			delivery: { status: this.webhook.url ? 'pending' : 'disabled', attempts: [] }
		};
		this.store.state.events[event.id] = record;
		this.store.save();
		// After the current API response is written, like Stripe's asynchronous delivery.
		if (this.webhook.url) this.later(0, () => void this.deliver(record, 0));
		return record;
	}

	/** Delivers one event again (a replay); resolves with the first attempt, later retries run on their own. */
	resend(record: EventRecord): Promise<DeliveryAttempt> {
		return this.deliver(record, 0);
	}

	close(): void {
		for (const t of this.timers) clearTimeout(t);
		this.timers.clear();
	}

	private async deliver(record: EventRecord, retryIndex: number): Promise<DeliveryAttempt> {
		const url = this.webhook.url;
		const payload = JSON.stringify(record.event, null, 2);
		const attempt = await postWebhook(
			url,
			payload,
			this.webhook.secret,
			record.delivery.attempts.length + 1
		);
		record.delivery.attempts.push(attempt);
		if (attempt.ok) {
			record.delivery.status = 'delivered';
			record.event.pending_webhooks = 0;
		} else if (retryIndex < this.webhook.retryDelaysMs.length) {
			record.delivery.status = 'pending';
			this.later(
				this.webhook.retryDelaysMs[retryIndex],
				() => void this.deliver(record, retryIndex + 1)
			);
		} else {
			record.delivery.status = 'failed';
		}
		this.store.save();
		return attempt;
	}

	private later(ms: number, fn: () => void): void {
		const t = setTimeout(() => {
			this.timers.delete(t);
			fn();
		}, ms);
		this.timers.add(t);
	}
}

/** Reading and replaying the Stripe stand-in's events (its /_fake controls), every call bounded. */
import { timedFetch } from './http';
import { world } from './world-info';

export interface DeliveryAttempt {
	attempt: number;
	status: number | null;
	ok: boolean;
}

export interface RecordedEvent {
	id: string;
	type: string;
	data: {
		object: { id: string; metadata?: Record<string, string>; hosted_invoice_url?: string | null };
	};
	delivery: {
		status: 'pending' | 'delivered' | 'failed' | 'disabled';
		attempts: DeliveryAttempt[];
	};
}

/** Every event of a type, newest first. */
export async function eventsOfType(type: string): Promise<RecordedEvent[]> {
	const answer = await timedFetch(
		`${world().stripeApi}/_fake/events?type=${encodeURIComponent(type)}`
	);
	if (answer.status !== 200) throw new Error(`/_fake/events answered ${answer.status}`);
	return answer.json.data as RecordedEvent[];
}

/** Every event of a type about one quote's invoices (metadata.quoteId), newest first. */
export async function eventsForQuote(type: string, quoteId: number): Promise<RecordedEvent[]> {
	return (await eventsOfType(type)).filter(
		(e) => e.data.object.metadata?.quoteId === String(quoteId)
	);
}

/** Delivers a recorded event again, freshly signed by the stand-in; answers the app's status. */
export async function resend(eventId: string): Promise<number | null> {
	const answer = await timedFetch(
		`${world().stripeApi}/_fake/events/${eventId}/resend`,
		{ method: 'POST' },
		15_000
	);
	if (answer.status !== 200) throw new Error(`resend ${eventId}: ${answer.status} ${answer.text}`);
	return (answer.json.attempt as DeliveryAttempt).status;
}

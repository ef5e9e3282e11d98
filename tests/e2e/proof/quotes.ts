/**
 * Quotes the proof suite owns, made through the API as the desk and the client would: a sent one,
 * a cancelled one (every state move on it is refused, so actions are harmless) and a confirmed
 * hire with its booking (paid through the Stripe stand-in).
 */
import { randomInt, randomUUID } from 'node:crypto';
import { BASE_URL } from '../browser';
import { api } from '../http';
import type { Sessions } from './people';
import { EMAILS } from './people';

export interface QuoteFixtures {
	sentQuoteId: number;
	cancelledQuoteId: number;
	confirmedQuoteId: number;
	bookingId: number;
}

function must(result: { status: number; json: unknown }, want: number, what: string): void {
	if (result.status !== want)
		throw new Error(`${what}: ${result.status} ${JSON.stringify(result.json).slice(0, 300)}`);
}

/** Hire dates far ahead and spread out, so the suite's bookings never meet another test's. */
function hireDates(): { startDate: string; endDate: string } {
	const day = new Date(Date.UTC(2060 + randomInt(0, 35), randomInt(0, 12), randomInt(1, 28)));
	const iso = day.toISOString().slice(0, 10);
	return { startDate: iso, endDate: iso };
}

async function createQuote(sessions: Sessions, clientId: number, label: string): Promise<number> {
	const request = {
		targetDb: 85,
		weighting: 'A',
		distance: 15,
		distanceUnit: 'm',
		programme: 'speech',
		...hireDates()
	};
	const ranked = await api('/api/evaluations', {
		cookie: sessions.sales,
		method: 'POST',
		body: request
	});
	must(ranked, 200, 'evaluation');
	const results = ranked.json.results as { packageId: number; verdict: string }[];
	const pick = results.find((r) => r.verdict !== 'short') ?? results[0];
	const created = await api('/api/quotes', {
		cookie: sessions.sales,
		method: 'POST',
		body: {
			clientId,
			eventName: `Proof suite ${label} ${randomUUID().slice(0, 8)}`,
			packageId: pick.packageId,
			request
		}
	});
	must(created, 201, `create ${label} quote`);
	return created.json.id as number;
}

export async function act(cookie: string | undefined, id: number, action: string): Promise<void> {
	must(
		await api(`/api/quotes/${id}/actions`, {
			cookie,
			method: 'POST',
			body: action === 'accept' ? { action, acceptTerms: true } : { action }
		}),
		200,
		`${action} quote ${id}`
	);
}

/** Pays the deposit on the stand-in's hosted page, then waits for the signed webhook to confirm. */
export async function payDeposit(sessions: Sessions, id: number): Promise<void> {
	const quote = await api(`/api/quotes/${id}`, { cookie: sessions.client });
	const hostedUrl = (quote.json.invoices as { kind: string; hostedUrl: string | null }[]).find(
		(i) => i.kind === 'deposit'
	)?.hostedUrl;
	if (!hostedUrl) throw new Error(`quote ${id} has no deposit invoice page`);
	const paid = await fetch(hostedUrl, {
		method: 'POST',
		redirect: 'manual',
		headers: { 'content-type': 'application/x-www-form-urlencoded' },
		body: new URLSearchParams({ card_number: '4242 4242 4242 4242', expiry: '12/40', cvc: '123' })
	});
	if (paid.status !== 303)
		throw new Error(`paying the deposit of quote ${id} answered ${paid.status}`);
	for (let i = 0; i < 80; i++) {
		const now = await api(`/api/quotes/${id}`, { cookie: sessions.sales });
		if (now.json.status === 'confirmed') return;
		if (now.json.bookingIssue)
			throw new Error(`quote ${id} could not be booked: ${now.json.bookingIssue}`);
		await new Promise((r) => setTimeout(r, 100));
	}
	throw new Error(`quote ${id} was not confirmed after its deposit was paid`);
}

/** The booking's id, read from the bookings list as the warehouse sees it. */
async function bookingOf(sessions: Sessions, id: number): Promise<number> {
	const { json: quote } = await api(`/api/quotes/${id}`, { cookie: sessions.sales });
	const page = await fetch(`${BASE_URL}/bookings`, {
		headers: { cookie: sessions.admin ?? '', accept: 'text/html' }
	});
	const cards = (await page.text()).split('href="/bookings/').slice(1);
	const card = cards.find((c) => c.includes(quote.eventName as string));
	const bookingId = Number(card?.match(/^(\d+)"/)?.[1]);
	if (!bookingId) throw new Error(`no booking listed for quote ${id}`);
	return bookingId;
}

export async function makeQuoteFixtures(sessions: Sessions): Promise<QuoteFixtures> {
	const users = await api('/api/users', { cookie: sessions.admin });
	const clientId = (users.json as { email: string; clientId: number | null }[]).find(
		(u) => u.email === EMAILS.client
	)?.clientId;
	if (!clientId) throw new Error(`${EMAILS.client} has no client organisation`);

	const sentQuoteId = await createQuote(sessions, clientId, 'sent');
	await act(sessions.sales, sentQuoteId, 'send');

	const cancelledQuoteId = await createQuote(sessions, clientId, 'cancelled');
	await act(sessions.sales, cancelledQuoteId, 'cancel');

	const confirmedQuoteId = await createQuote(sessions, clientId, 'confirmed');
	await act(sessions.sales, confirmedQuoteId, 'send');
	await act(sessions.client, confirmedQuoteId, 'accept');
	await payDeposit(sessions, confirmedQuoteId);
	return {
		sentQuoteId,
		cancelledQuoteId,
		confirmedQuoteId,
		bookingId: await bookingOf(sessions, confirmedQuoteId)
	};
}

/** Quotes made through the API as the hire desk would, each on its own dates so tests never share stock. */
import { expect } from 'vitest';
import { ADMIN, SALES, api, signIn } from './http';

export const CLIENT_SCHOOL = 'events@st-aldric.test';
export const CLIENT_FESTIVAL = 'organiser@millbrook-riverside.test';

export interface QuoteRequest {
	clientEmail: string;
	eventName: string;
	/** One hire day, YYYY-MM-DD. */
	date: string;
}

export async function clientIdOf(email: string): Promise<number> {
	const users = await api('/api/users', { cookie: await signIn(ADMIN) });
	const id = (users.json as { email: string; clientId: number | null }[]).find(
		(u) => u.email === email
	)?.clientId;
	if (!id) throw new Error(`no client user ${email}`);
	return id;
}

/** Evaluates the request, saves the first package that is not short, answers the quote id (a draft). */
export async function draftQuote(
	sales: string,
	{ clientEmail, eventName, date }: QuoteRequest
): Promise<number> {
	const request = {
		targetDb: 85,
		weighting: 'A',
		distance: 15,
		distanceUnit: 'm',
		programme: 'speech',
		startDate: date,
		endDate: date
	};
	const ranked = await api('/api/evaluations', {
		cookie: sales,
		method: 'POST',
		body: request,
		timeoutMs: 10_000
	});
	expect(ranked.status).toBe(200);
	const results = ranked.json.results as { verdict: string; packageId: number }[];
	const pick = results.find((r) => r.verdict !== 'short') ?? results[0];
	const created = await api('/api/quotes', {
		cookie: sales,
		method: 'POST',
		body: {
			clientId: await clientIdOf(clientEmail),
			eventName,
			packageId: pick.packageId,
			request
		},
		timeoutMs: 10_000
	});
	expect(created.status, created.text).toBe(201);
	return created.json.id as number;
}

/** A quote sent to the client (the e-mail delivered at once while the sink is up). */
export async function sentQuote(quote: QuoteRequest): Promise<number> {
	const sales = await signIn(SALES);
	const id = await draftQuote(sales, quote);
	const sent = await api(`/api/quotes/${id}/actions`, {
		cookie: sales,
		method: 'POST',
		body: { action: 'send' },
		timeoutMs: 10_000
	});
	expect(sent.status, sent.text).toBe(200);
	return id;
}

/** The quote as the desk sees it (with e-mails and invoices). */
export async function deskView(id: number) {
	const answer = await api(`/api/quotes/${id}`, { cookie: await signIn(SALES) });
	expect(answer.status, answer.text).toBe(200);
	return answer.json as {
		status: string;
		bookingIssue: string | null;
		emails: { id: number; subject: string; status: string; toAddress: string }[];
		invoices: {
			kind: string;
			status: string;
			hostedUrl: string | null;
			lastPaymentError: string | null;
		}[];
	};
}

/** Quotes for new clients, made through the API as the desk would, for the client-side tests. */
import { createHash, randomBytes, randomInt, randomUUID } from 'node:crypto';
import { expect } from 'vitest';
import { SignInLink, User } from '../../src/lib/server/db/models';
import { BASE_URL } from '../e2e/browser';
import { api, sessionCookie } from '../e2e/http';
import { ADMIN, SALES } from './demo-accounts';
export { ADMIN, SALES } from './demo-accounts';


export const tag = () => randomUUID().slice(0, 8);

/** Hire dates far ahead and spread out, so these quotes never compete with another test's bookings. */
function hireDates(): { startDate: string; endDate: string } {
	const day = new Date(Date.UTC(2050 + randomInt(0, 40), randomInt(0, 12), randomInt(1, 28)));
	const iso = day.toISOString().slice(0, 10);
	return { startDate: iso, endDate: iso };
}

/** A quote for a brand-new client organisation (its contact has never signed in), sent by the desk. */
export async function sentQuoteForNewClient(label: string): Promise<{ id: number; email: string; clientId: number }> {
	const sales = await sessionCookie(SALES);
	const request = { targetDb: 85, weighting: 'A', distance: 15, distanceUnit: 'm', programme: 'speech', ...hireDates() };
	const ranked = await api('/api/evaluations', { cookie: sales, method: 'POST', body: request });
	expect(ranked.status).toBe(200);
	const pick = ranked.json.results.find((r: { verdict: string }) => r.verdict !== 'short') ?? ranked.json.results[0];
	const t = tag();
	const email = `organiser-${t}@example.test`;
	const created = await api('/api/quotes', {
		cookie: sales,
		method: 'POST',
		body: {
			newClient: { name: `${label} organisers ${t}`, contactName: `Rowan ${t}`, email },
			eventName: `${label} ${t}`,
			packageId: pick.packageId,
			request
		}
	});
	expect(created.status).toBe(201);
	const sent = await api(`/api/quotes/${created.json.id}/actions`, { cookie: sales, method: 'POST', body: { action: 'send' } });
	expect(sent.status).toBe(200);
	return { id: created.json.id, email, clientId: created.json.clientId };
}

/** The one-time sign-in link in an e-mail's text. */
export function linkIn(text: string, kind: 'signin/link' | 'signin/reset' = 'signin/link'): string {
	const match = text.match(new RegExp(`https?://[^\\s]+/${kind}/[\\w-]+`));
	if (!match) throw new Error(`no ${kind} link in the e-mail`);
	return match[0];
}

/** Signs a client contact in the way their e-mailed link would (needs useTestDatabase in the file). */
export async function clientSessionFor(email: string): Promise<string> {
	const user = (await User.findOne({ where: { email } }))!;
	const token = randomBytes(32).toString('base64url');
	await SignInLink.create({ userId: user.id, tokenHash: createHash('sha256').update(token).digest('hex'), redirectTo: '/', expiresAt: new Date(Date.now() + 600_000) });
	const pressed = await fetch(`${BASE_URL}/signin/link/${token}`, {
		method: 'POST',
		redirect: 'manual',
		headers: { origin: BASE_URL, accept: 'text/html', 'content-type': 'application/x-www-form-urlencoded' },
		body: ''
	});
	const cookie = pressed.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
	if (!cookie.includes('session-token')) throw new Error(`signing ${email} in by link answered ${pressed.status}`);
	return cookie;
}

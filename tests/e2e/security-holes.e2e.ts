/**
 * The holes a probe of the running product found (issue 14), one `describe` each, tried from outside
 * as an attacker would. Each test failed against the app before its fix.
 */
import { randomUUID } from 'node:crypto';
import Stripe from 'stripe';
import { beforeAll, describe, expect, it } from 'vitest';
import { BASE_URL, launchBrowser, signIn } from './browser';
import { api, sessionCookie } from './http';
import { ADMIN, SALES, WAREHOUSE } from '../helpers/demo-accounts';

const CLIENT = 'organiser@millbrook-riverside.test';

let admin: string;
let sales: string;
beforeAll(async () => {
	admin = await sessionCookie(ADMIN);
	sales = await sessionCookie(SALES);
});

const stripe = new Stripe(process.env.STRIPE_SECRET_KEY ?? 'sk_test_throwline_test_only', {
	host: '127.0.0.1',
	port: Number(process.env.STRIPE_API_PORT ?? 12211),
	protocol: 'http'
});

/** A day far enough ahead that no other test shares its stock, different on every run. */
function futureDay(): string {
	const day = new Date(Date.UTC(2036, 0, 1) + Math.floor(Math.random() * 3000) * 86_400_000);
	return day.toISOString().slice(0, 10);
}

function requestFor(startDate: string, endDate = startDate) {
	return { targetDb: 85, weighting: 'A', distance: 15, distanceUnit: 'm', programme: 'speech', startDate, endDate };
}

async function somePackageId(request = requestFor(futureDay())): Promise<number> {
	const ranked = await api('/api/evaluations', { cookie: sales, method: 'POST', body: request });
	expect(ranked.status).toBe(200);
	const results = ranked.json.results as { verdict: string; packageId: number }[];
	return (results.find((r) => r.verdict !== 'short') ?? results[0]).packageId;
}

async function clientIdOf(email: string): Promise<number> {
	const users = await api('/api/users', { cookie: admin });
	return (users.json as { email: string; clientId: number }[]).find((u) => u.email === email)!.clientId;
}

/** A fresh staff account with a known password (so throttling one never touches another test). */
async function freshStaff(role = 'sales'): Promise<{ id: number; email: string; password: string }> {
	const email = `probe-${randomUUID().slice(0, 8)}@example.test`;
	const password = `pw-${randomUUID()}`;
	const made = await api('/api/users', { cookie: admin, method: 'POST', body: { email, name: 'Probe Person', role, password } });
	expect(made.status).toBe(201);
	return { id: made.json.user.id, email, password };
}

function credentialsPost(email: string, password: string) {
	return fetch(`${BASE_URL}/auth/callback/credentials`, {
		method: 'POST',
		redirect: 'manual',
		headers: { origin: BASE_URL, 'content-type': 'application/x-www-form-urlencoded' },
		body: new URLSearchParams({ email, password })
	});
}

function formPost(email: string, password: string) {
	return fetch(`${BASE_URL}/signin`, {
		method: 'POST',
		redirect: 'manual',
		headers: { origin: BASE_URL, accept: 'text/html', 'content-type': 'application/x-www-form-urlencoded' },
		body: new URLSearchParams({ email, password, redirectTo: '/' })
	});
}

describe('1. sign-in links are only ever for client accounts', () => {
	it('refuses a new client whose e-mail belongs to a staff account, on that field', async () => {
		const request = requestFor(futureDay());
		const created = await api('/api/quotes', {
			cookie: sales,
			method: 'POST',
			body: {
				newClient: { name: 'Borrowed address', contactName: 'Someone Else', email: 'ADMIN@kestrel-yard.test' },
				eventName: 'Probe event',
				packageId: await somePackageId(request),
				request
			}
		});
		expect(created.status).toBe(422);
		expect(created.json.errors['newClient.email']).toEqual([expect.stringMatching(/staff/i)]);
	});
});

describe('2. after sign-in, only same-site paths', () => {
	const hostile = ['/%09/evil.example/', '/%0a/evil.example', '//evil.example', '/%5Cevil.example', 'https://evil.example/', '/%0d%0a/evil.example'];
	for (const target of hostile) {
		it(`a signed-in visit to /signin?redirectTo=${target} stays on the site`, async () => {
			const answer = await fetch(`${BASE_URL}/signin?redirectTo=${target}`, { redirect: 'manual', headers: { cookie: sales } });
			expect(answer.status).toBe(303);
			const location = answer.headers.get('location')!;
			expect(new URL(location, BASE_URL).origin).toBe(new URL(BASE_URL).origin);
			expect(location).not.toMatch(/[\t\n\r\\]/);
		});
	}
});

describe('3. sign-in throttling', () => {
	it('locks an account after a few wrong passwords, answers 429 with a retry time, even for the right password', async () => {
		const person = await freshStaff();
		const statuses: number[] = [];
		for (let i = 0; i < 8; i++) statuses.push((await credentialsPost(person.email, 'wrong-password')).status);
		const throttled = await credentialsPost(person.email, person.password);
		expect(statuses.slice(0, 3).every((s) => s !== 429)).toBe(true);
		expect(statuses.at(-1)).toBe(429);
		expect(throttled.status).toBe(429);
		expect(Number(throttled.headers.get('retry-after'))).toBeGreaterThan(0);
		expect((await throttled.json()).message).toMatch(/try again/i);
		const form = await formPost(person.email, person.password);
		expect(form.status).toBe(429);
		expect(await form.text()).toMatch(/try again in/i);
	});

	it('an unknown e-mail is throttled exactly like a real one (nothing revealed)', async () => {
		const person = await freshStaff();
		const unknown = `nobody-${randomUUID().slice(0, 8)}@example.test`;
		const real: number[] = [];
		const fake: number[] = [];
		for (let i = 0; i < 8; i++) {
			real.push((await credentialsPost(person.email, 'wrong')).status);
			fake.push((await credentialsPost(unknown, 'wrong')).status);
		}
		expect(fake).toEqual(real);
		const [a, b] = [await formPost(person.email, 'wrong'), await formPost(unknown, 'wrong')];
		expect(b.status).toBe(a.status);
	});
});

describe('4. signing out ends the session', () => {
	it('the old cookie no longer works after sign-out', async () => {
		const person = await freshStaff();
		const cookie = await sessionCookie(person.email, person.password);
		expect((await api('/api/quotes', { cookie })).status).toBe(200);
		const out = await fetch(`${BASE_URL}/signout`, {
			method: 'POST',
			redirect: 'manual',
			headers: { cookie, origin: BASE_URL, accept: 'text/html', 'content-type': 'application/x-www-form-urlencoded' },
			body: ''
		});
		expect(out.status).toBeLessThan(400);
		expect((await api('/api/quotes', { cookie })).status).toBe(401);
	});

	it('deactivating and reactivating an account does not bring its old sessions back', async () => {
		const person = await freshStaff();
		const cookie = await sessionCookie(person.email, person.password);
		expect((await api('/api/quotes', { cookie })).status).toBe(200);
		expect((await api(`/api/users/${person.id}`, { cookie: admin, method: 'PATCH', body: { active: false } })).status).toBe(200);
		expect((await api(`/api/users/${person.id}`, { cookie: admin, method: 'PATCH', body: { active: true } })).status).toBe(200);
		expect((await api('/api/quotes', { cookie })).status).toBe(401);
		expect((await api('/api/quotes', { cookie: await sessionCookie(person.email, person.password) })).status).toBe(200);
	});
});

describe('5. security headers on every answer, and a failed sign-in is not a 500', () => {
	it('the pages work under the CSP: no violation reported by the browser', async () => {
		const browser = await launchBrowser();
		const violations: string[] = [];
		try {
			const visits = [
				[SALES, ['/', '/quotes', '/quotes/new', '/bookings']],
				[WAREHOUSE, ['/inventory/loudspeakers', '/inventory/units', '/inventory/packages']],
				[ADMIN, ['/admin/users', '/admin/settings']]
			] as const;
			for (const [who, paths] of visits) {
				const page = await browser.newPage();
				page.on('console', (m) => {
					if (/Content Security Policy|Refused to/i.test(m.text())) violations.push(`${page.url()}: ${m.text().slice(0, 160)}`);
				});
				await signIn(page, who);
				await page.waitForURL(`${BASE_URL}/`);
				for (const path of paths) {
					await page.goto(`${BASE_URL}${path}`);
					await page.waitForLoadState('networkidle');
				}
				await page.close();
			}
		} finally {
			await browser.close();
		}
		expect(violations).toEqual([]);
	}, 120_000);

	const expectHeaders = (response: Response) => {
		expect(response.headers.get('x-content-type-options')).toBe('nosniff');
		expect(response.headers.get('referrer-policy')).toBe('same-origin');
		expect(response.headers.get('x-frame-options')).toBe('DENY');
		expect(response.headers.get('permissions-policy')).toMatch(/camera=\(self\)/);
	};

	it('a wrong password posted to the credentials callback is a redirect to sign-in, with headers', async () => {
		const person = await freshStaff();
		const answer = await credentialsPost(person.email, 'not-it');
		expect(answer.status).toBeGreaterThanOrEqual(300);
		expect(answer.status).toBeLessThan(400);
		expect(answer.headers.get('location')).toContain('/signin');
		expectHeaders(answer);
	});

	it('redirects, 403s, 404s and assets carry the headers; pages carry a CSP', async () => {
		expectHeaders(await fetch(`${BASE_URL}/quotes`, { redirect: 'manual' }));
		expectHeaders(await fetch(`${BASE_URL}/api/users`, { headers: { cookie: sales } }));
		expectHeaders(await fetch(`${BASE_URL}/no-such-page`, { headers: { cookie: sales } }));
		const page = await fetch(`${BASE_URL}/signin`);
		expectHeaders(page);
		const csp = page.headers.get('content-security-policy') ?? '';
		expect(csp).toMatch(/default-src 'self'/);
		expect(csp).toMatch(/frame-ancestors 'none'/);
		expect(csp).not.toMatch(/unsafe-eval/);
		const asset = (await page.text()).match(/\/_app\/immutable\/[^"']+\.js/)![0];
		expectHeaders(await fetch(`${BASE_URL}${asset}`));
	});
});

/** The payment service's id of an invoice, read from its hosted page address (…/pay/in_…). */
const stripeIdOf = (invoice: { hostedUrl: string }) => new URL(invoice.hostedUrl).pathname.split('/').pop()!;

/** A quote confirmed by a paid deposit (paid out of band at the stand-in, whose webhook confirms it). */
async function confirmedQuote(): Promise<number> {
	const request = requestFor(futureDay());
	const created = await api('/api/quotes', {
		cookie: sales,
		method: 'POST',
		body: { clientId: await clientIdOf(CLIENT), eventName: 'Probe hire', packageId: await somePackageId(request), request }
	});
	expect(created.status).toBe(201);
	const id = created.json.id as number;
	expect((await api(`/api/quotes/${id}/actions`, { cookie: sales, method: 'POST', body: { action: 'send' } })).status).toBe(200);
	expect((await api(`/api/quotes/${id}/actions`, { cookie: sales, method: 'POST', body: { action: 'accept' } })).status).toBe(200);
	const deposit = (await api(`/api/quotes/${id}`, { cookie: sales })).json.invoices.find((i: { kind: string }) => i.kind === 'deposit');
	await stripe.invoices.pay(stripeIdOf(deposit), { paid_out_of_band: true });
	for (let i = 0; i < 100; i++) {
		if ((await api(`/api/quotes/${id}`, { cookie: sales })).json.status === 'confirmed') return id;
		await new Promise((r) => setTimeout(r, 100));
	}
	throw new Error(`quote ${id} was not confirmed`);
}

describe('6. the balance invoice is e-mailed once however often it is asked for', () => {
	it('20 concurrent requests: one invoice, exactly one e-mail', async () => {
		const id = await confirmedQuote();
		const answers = await Promise.all(
			Array.from({ length: 20 }, () => api(`/api/quotes/${id}/balance-invoice`, { cookie: sales, method: 'POST' }))
		);
		expect(answers.every((a) => [200, 201, 409].includes(a.status))).toBe(true);
		expect(answers.filter((a) => a.status === 201)).toHaveLength(1);
		const desk = (await api(`/api/quotes/${id}`, { cookie: sales })).json;
		expect(desk.invoices.filter((i: { kind: string }) => i.kind === 'balance')).toHaveLength(1);
		expect(desk.emails.filter((e: { subject: string }) => /invoice for the balance/i.test(e.subject))).toHaveLength(1);
	}, 120_000);
});

describe('7. hire dates and amounts within bounds', () => {
	const today = () => {
		const now = new Date();
		return `${now.getFullYear()}-${String(now.getMonth() + 1).padStart(2, '0')}-${String(now.getDate()).padStart(2, '0')}`;
	};

	it('refuses a start in the past (422 on startDate); today is fine', async () => {
		const past = await api('/api/evaluations', { cookie: sales, method: 'POST', body: requestFor('2020-01-01') });
		expect(past.status).toBe(422);
		expect(past.json.errors.startDate).toEqual([expect.stringMatching(/past/i)]);
		expect((await api('/api/evaluations', { cookie: sales, method: 'POST', body: requestFor(today()) })).status).toBe(200);
	});

	it('refuses a hire of more than 365 days, and the year-9999 hire is a 422, not a 500', async () => {
		const start = futureDay();
		const long = await api('/api/evaluations', { cookie: sales, method: 'POST', body: requestFor(start, '9999-12-31') });
		expect(long.status).toBe(422);
		expect(long.json.errors.endDate).toEqual([expect.stringMatching(/365 days/)]);
		const request = requestFor(start, '9999-12-31');
		const quote = await api('/api/quotes', {
			cookie: sales,
			method: 'POST',
			body: { clientId: await clientIdOf(CLIENT), eventName: 'Forever hire', packageId: await somePackageId(), request }
		});
		expect(quote.status).toBe(422);
	});
});

const WEBHOOK_SECRET = process.env.STRIPE_WEBHOOK_SECRET ?? 'whsec_throwline_test_only';

function postEvent(event: object, timestamp = Math.floor(Date.now() / 1000)) {
	const payload = JSON.stringify(event);
	const header = stripe.webhooks.generateTestHeaderString({ payload, secret: WEBHOOK_SECRET, timestamp });
	return fetch(`${BASE_URL}/api/webhooks/stripe`, {
		method: 'POST',
		headers: { 'stripe-signature': header, 'content-type': 'application/json' },
		body: payload
	});
}

function paidEvent(invoice: Stripe.Invoice) {
	return {
		id: `evt_probe_${randomUUID().replaceAll('-', '')}`,
		object: 'event',
		type: 'invoice.paid',
		created: Math.floor(Date.now() / 1000),
		data: { object: { ...invoice, status: 'paid', amount_paid: 1, amount_remaining: 0 } }
	};
}

async function acceptedQuote(): Promise<{ id: number; stripeInvoiceId: string }> {
	const request = requestFor(futureDay());
	const created = await api('/api/quotes', {
		cookie: sales,
		method: 'POST',
		body: { clientId: await clientIdOf(CLIENT), eventName: 'Probe deposit', packageId: await somePackageId(request), request }
	});
	const id = created.json.id as number;
	await api(`/api/quotes/${id}/actions`, { cookie: sales, method: 'POST', body: { action: 'send' } });
	await api(`/api/quotes/${id}/actions`, { cookie: sales, method: 'POST', body: { action: 'accept' } });
	const deposit = (await api(`/api/quotes/${id}`, { cookie: sales })).json.invoices.find((i: { kind: string }) => i.kind === 'deposit');
	return { id, stripeInvoiceId: stripeIdOf(deposit) };
}

const depositOf = async (id: number) =>
	(await api(`/api/quotes/${id}`, { cookie: sales })).json.invoices.find((i: { kind: string }) => i.kind === 'deposit');

describe('8. webhooks are checked against the payment service', () => {
	it('a signed "paid" event for an invoice the payment service still has open changes nothing', async () => {
		const { id, stripeInvoiceId } = await acceptedQuote();
		const answer = await postEvent(paidEvent(await stripe.invoices.retrieve(stripeInvoiceId)));
		expect(answer.status).toBe(200);
		expect((await depositOf(id)).status).toBe('open');
		expect((await api(`/api/quotes/${id}`, { cookie: sales })).json.status).toBe('accepted');
	});

	it('a "paid" event for an invoice we voided changes nothing', async () => {
		const { id, stripeInvoiceId } = await acceptedQuote();
		await stripe.invoices.voidInvoice(stripeInvoiceId);
		for (let i = 0; i < 50 && (await depositOf(id)).status !== 'void'; i++) await new Promise((r) => setTimeout(r, 100));
		expect((await depositOf(id)).status).toBe('void');
		const answer = await postEvent(paidEvent(await stripe.invoices.retrieve(stripeInvoiceId)));
		expect(answer.status).toBe(200);
		expect((await depositOf(id)).status).toBe('void');
	});

	it('refuses a signature dated more than 5 minutes ahead (400)', async () => {
		const event = { id: `evt_probe_${randomUUID().replaceAll('-', '')}`, object: 'event', type: 'ping.probe', data: { object: {} } };
		expect((await postEvent(event, Math.floor(Date.now() / 1000) + 600)).status).toBe(400);
		expect((await postEvent(event)).status).toBe(200);
	});
});

describe('9. spec sheets are downloaded, never rendered as our page', () => {
	it('serves a PDF as an attachment with nosniff', async () => {
		const warehouse = await sessionCookie(WAREHOUSE);
		const speakers = await api('/api/loudspeakers', { cookie: warehouse });
		const speakerId = (speakers.json.items ?? speakers.json.rows ?? speakers.json)[0].id;
		const data = new FormData();
		data.set('kind', 'spec-sheet');
		data.set('file', new Blob([new TextEncoder().encode('%PDF-1.4\n<html><script>alert(1)</script></html>\n')]), 'sheet.pdf');
		const stored = await fetch(`${BASE_URL}/api/loudspeakers/${speakerId}/attachments`, {
			method: 'POST',
			headers: { cookie: warehouse, origin: BASE_URL },
			body: data
		});
		expect(stored.status).toBe(201);
		const served = await fetch(`${BASE_URL}/api/attachments/${(await stored.json()).id}`, { headers: { cookie: warehouse } });
		expect(served.headers.get('content-disposition')).toMatch(/^attachment;/);
		expect(served.headers.get('x-content-type-options')).toBe('nosniff');
	});
});



/**
 * Client records over the API, the quote document as a PDF, and the calm refusals: an unknown or
 * expired sign-in link, a link asked for a staff address, accepting an expired quote.
 */
import { createHash, randomBytes } from 'node:crypto';
import { PDFParse } from 'pdf-parse';
import { beforeAll, describe, expect, it } from 'vitest';
import { Quote, SignInLink, User } from '../../src/lib/server/db/models';
import { formatMoney } from '../../src/lib/quotes/pricing';
import { waitForMail, listMail } from '../fakes/mailbox';
import { useTestDatabase } from '../helpers/db';
import { clientSessionFor, sentQuoteForNewClient, tag, SALES, ADMIN } from '../helpers/deal';
import { BASE_URL } from './browser';
import { api, sessionCookie } from './http';
import { formatDate } from '../../src/lib/format/dates';
import { WAREHOUSE } from '../helpers/demo-accounts';

useTestDatabase();
let sales: string;
let warehouse: string;
let client: string;
beforeAll(async () => {
	sales = await sessionCookie(SALES);
	warehouse = await sessionCookie(WAREHOUSE);
	client = await sessionCookie('events@st-aldric.test');
});

describe('client records', () => {
	it('the desk creates, finds and corrects a client; each change is in its history', async () => {
		const t = tag();
		const created = await api('/api/clients', {
			cookie: sales,
			method: 'POST',
			body: { name: `Harbour Lantern Parade ${t}`, contactName: 'Nell Archer', email: `nell-${t}@exmaple.test`, billingAddress: '1 Quay Street\nPortwell' }
		});
		expect(created.status).toBe(201);
		const id = created.json.id as number;

		const found = await api(`/api/clients?q=${encodeURIComponent(`Lantern Parade ${t}`)}`, { cookie: warehouse });
		expect(found.status).toBe(200);
		expect(found.json.map((c: { id: number }) => c.id)).toEqual([id]);

		const fixed = await api(`/api/clients/${id}`, { cookie: sales, method: 'PATCH', body: { email: `nell-${t}@example.test`, taxNumber: 'XX 123' } });
		expect(fixed.status).toBe(200);
		expect(fixed.json.email).toBe(`nell-${t}@example.test`);
		const history = fixed.json.history as { field: string; oldValue: string | null; newValue: string | null; changedBy: string }[];
		expect(history).toEqual(
			expect.arrayContaining([
				expect.objectContaining({ field: 'email', oldValue: `nell-${t}@exmaple.test`, newValue: `nell-${t}@example.test` }),
				expect.objectContaining({ field: 'taxNumber', oldValue: null, newValue: 'XX 123' })
			])
		);
	});

	it('the warehouse reads but cannot edit; a client sees no client records', async () => {
		const list = await api('/api/clients', { cookie: sales });
		const id = list.json[0].id;
		expect((await api(`/api/clients/${id}`, { cookie: warehouse })).status).toBe(200);
		expect((await api(`/api/clients/${id}`, { cookie: warehouse, method: 'PATCH', body: { notes: 'x' } })).status).toBe(403);
		expect((await api(`/api/clients/${id}`, { cookie: client })).status).toBe(403);
		expect((await api('/api/clients', { cookie: client })).status).toBe(403);
	});

	it('refuses a record without a valid e-mail, field by field', async () => {
		const bad = await api('/api/clients', { cookie: sales, method: 'POST', body: { name: 'X Y', contactName: 'A B', email: 'not-an-address' } });
		expect(bad.status).toBe(422);
		expect(bad.json.errors.email).toBeDefined();
	});
});

describe('the quote document', () => {
	it('is a PDF with the quote number, total, deposit, validity, terms and equipment; another client gets 404', async () => {
		const { id, email } = await sentQuoteForNewClient('Document check');
		const quote = (await api(`/api/quotes/${id}`, { cookie: sales })).json;
		const response = await fetch(`${BASE_URL}/api/quotes/${id}/document`, { headers: { cookie: sales } });
		expect(response.status).toBe(200);
		expect(response.headers.get('content-type')).toBe('application/pdf');
		const parser = new PDFParse({ data: new Uint8Array(await response.arrayBuffer()) });
		const text = (await parser.getText()).text.replace(/\s+/g, ' ');
		const price = quote.result.price;
		expect(text).toContain(quote.reference);
		expect(text).toContain(formatMoney(price.totalMinor, price.currency));
		expect(text).toContain(formatMoney(price.depositMinor, price.currency));
		expect(quote.validUntil).toMatch(/^\d{4}-\d{2}-\d{2}$/);
		expect(text).toContain(`Valid until: ${formatDate(quote.validUntil)}`); // the one date format, "1 Jan 2027"
		expect(text).toMatch(/Cancellation: cancel at least \d+ days before the hire starts/);
		for (const line of [...quote.result.billOfMaterials.loudspeakers, ...quote.result.billOfMaterials.amplifiers]) {
			expect(text).toContain(`${line.count} × ${line.name}`);
		}

		// The quote e-mail carries the same document.
		const mail = await waitForMail({ to: email, subjectIncludes: quote.reference });
		expect(mail.attachments.map((a) => a.contentType)).toContain('application/pdf');

		const stranger = await fetch(`${BASE_URL}/api/quotes/${id}/document`, { headers: { cookie: client } });
		expect(stranger.status).toBe(404);
		const warehouseAnswer = await fetch(`${BASE_URL}/api/quotes/${id}/document`, { headers: { cookie: warehouse } });
		expect(warehouseAnswer.status).toBe(403);
	});
});

describe('bad input gets a calm answer and changes nothing', () => {
	it('an unknown sign-in link and an expired one show the expired page and sign nobody in', async () => {
		const unknown = await fetch(`${BASE_URL}/signin/link/${randomBytes(32).toString('base64url')}`, { headers: { accept: 'text/html' } });
		expect(await unknown.text()).toContain('This link has expired');

		const { email } = await sentQuoteForNewClient('Expired link');
		const user = (await User.findOne({ where: { email } }))!;
		const token = randomBytes(32).toString('base64url');
		await SignInLink.create({ userId: user.id, tokenHash: createHash('sha256').update(token).digest('hex'), redirectTo: '/', expiresAt: new Date(Date.now() - 60_000) });
		const page = await fetch(`${BASE_URL}/signin/link/${token}`, { headers: { accept: 'text/html' } });
		expect(await page.text()).toContain('This link has expired');
		const pressed = await fetch(`${BASE_URL}/signin/link/${token}`, {
			method: 'POST',
			redirect: 'manual',
			headers: { origin: BASE_URL, accept: 'text/html', 'content-type': 'application/x-www-form-urlencoded' },
			body: ''
		});
		expect(pressed.status).toBe(410);
		expect(pressed.headers.getSetCookie().some((c) => c.includes('session-token='))).toBe(false);
	});

	it('a sign-in link asked for a staff address is answered 202 like any other, and none is sent', async () => {
		const since = new Date();
		const staff = WAREHOUSE;
		const answer = await api('/api/sign-in-links', { method: 'POST', body: { email: staff } });
		expect(answer.status).toBe(202);
		const nobody = await api('/api/sign-in-links', { method: 'POST', body: { email: `nobody-${tag()}@example.test` } });
		expect(nobody.status).toBe(202);
		expect(nobody.json.message).toBe(answer.json.message);
		await new Promise((r) => setTimeout(r, 1500));
		const mails = (await listMail({ to: staff })).filter((m) => m.receivedAt >= since.toISOString());
		expect(mails).toEqual([]);
	});

	it('accepting an expired quote is refused with its last valid day, and the quote stays as it was', async () => {
		const { id, email } = await sentQuoteForNewClient('Expired quote');
		await Quote.update({ validUntil: '2020-01-31' }, { where: { id } });
		const cookie = await clientSessionFor(email);
		const refused = await api(`/api/quotes/${id}/actions`, { cookie, method: 'POST', body: { action: 'accept', acceptTerms: true } });
		expect(refused.status).toBe(409);
		expect(refused.json.message).toContain('valid until 31 Jan 2020');
		const after = await api(`/api/quotes/${id}`, { cookie: await sessionCookie(ADMIN) });
		expect(after.json.status).toBe('sent');
		expect(after.json.invoices).toEqual([]);
		const pageHtml = await (await fetch(`${BASE_URL}/quotes/${id}`, { headers: { cookie, accept: 'text/html' } })).text();
		expect(pageHtml).toContain('can no longer be accepted');
	});

	it('a client accepting without ticking the terms is asked to, and nothing changes', async () => {
		const { id, email } = await sentQuoteForNewClient('Unticked terms');
		const cookie = await clientSessionFor(email);
		const refused = await api(`/api/quotes/${id}/actions`, { cookie, method: 'POST', body: { action: 'accept' } });
		expect(refused.status).toBe(422);
		expect(refused.json.errors.acceptTerms).toBeDefined();
		expect((await api(`/api/quotes/${id}`, { cookie })).json.status).toBe('sent');
	});
});

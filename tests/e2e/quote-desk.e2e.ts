import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { waitForMail } from '../fakes/mailbox';
import { BASE_URL, launchBrowser, screenshot, signIn } from './browser';
import { CLIENT_EMAIL, openDeskRequest } from './desk';
import { api, sessionCookie } from './http';
import { DEMO_PASSWORD, SALES, WAREHOUSE } from '../helpers/demo-accounts';

let browser: Browser;
beforeAll(async () => {
	browser = await launchBrowser();
});
afterAll(async () => {
	await browser?.close();
});

describe('the desk flow, end to end', () => {
	let quoteUrl = '';
	let reference = '';

	it('sales fills the request, sees ranked packages, saves and sends the quote', async () => {
		const page = await openDeskRequest(browser, { event: 'Riverside main stage, browser test', from: '2032-07-03', until: '2032-07-04', levelDb: 95, distanceM: 25 });
		await page.getByLabel(/There is a limit at a boundary/).check();
		await page.getByLabel(/Distance from the system/, { exact: false }).last().fill('300');
		await page.getByLabel(/^Limit/).fill('70');
		await page.getByText(/packages checked/).waitFor();
		await expect(page.getByText('At the boundary').first().isVisible()).resolves.toBe(true);
		await page.getByRole('img', { name: /Level versus distance|front of house/i }).first().waitFor();
		await screenshot(page, 'quote-new-1280');

		await page.getByRole('button', { name: /^Save quote with/ }).click();
		await page.waitForURL(/\/quotes\/\d+$/);
		quoteUrl = page.url();
		reference = (await page.locator('p', { hasText: /^Q-\d+/ }).first().textContent())!.match(/Q-\d+/)![0];

		const since = new Date();
		await page.getByRole('button', { name: 'Send to client' }).click();
		await page.getByText('Sent: the client has the quote by e-mail.').waitFor();
		await expect(page.getByTestId('quote-status').textContent()).resolves.toBe('Sent to client');
		const mail = await waitForMail({ to: CLIENT_EMAIL, subjectIncludes: reference, since, timeoutMs: 10_000 });
		expect(mail.text).toContain('Riverside main stage, browser test');
		expect(mail.text).toContain('95 dB(A) average level (Leq) at 25 m');
		expect(mail.text).toMatch(/At the boundary, 300 m away, we predict/);
		expect(mail.text).toContain(`/signin?redirectTo=${encodeURIComponent(new URL(quoteUrl).pathname)}`);
		await page.close();
	});

	it('the client follows the e-mailed link, signs in and reads the quote with its cautions', async () => {
		const mail = await waitForMail({ to: CLIENT_EMAIL, subjectIncludes: reference });
		const link = mail.text.match(/http:\/\/\S+\/signin\?redirectTo=\S+/)![0];
		const page = await browser.newPage({ viewport: { width: 390, height: 844 } });
		await page.goto(link);
		await page.getByLabel('E-mail').fill(CLIENT_EMAIL);
		await page.getByLabel('Password').fill(DEMO_PASSWORD);
		await page.getByRole('button', { name: 'Sign in' }).click();
		await page.waitForURL(quoteUrl);
		await page.getByRole('heading', { name: 'Riverside main stage, browser test' }).waitFor();
		await page.getByText('In short').waitFor();
		await page.getByRole('complementary', { name: 'Assumptions and cautions' }).waitFor();
		// The client reads the short cautions and what the outcomes mean, not the modelling footnotes.
		const cautions = await page.getByRole('complementary', { name: 'Assumptions and cautions' }).textContent();
		expect(cautions).toMatch(/Clear means .*Tight means .*Short means .*Over the limit means/);
		expect(cautions).toContain('Hearing safety');
		expect(cautions).not.toContain('transition distance');
		await expect(page.getByRole('button', { name: 'Accept this quote' }).isVisible()).resolves.toBe(true);
		const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
		expect(overflow).toBeLessThanOrEqual(0);
		await screenshot(page, 'quote-client-390');
		await page.goto(`${quoteUrl}/print`);
		const printed = await page.locator('main').textContent();
		expect(printed).toContain('Hearing safety: sound at these levels can damage hearing.');
		expect(printed).toMatch(/Assessment: \w.*Clear means/);
		await page.close();
	});

	it('another client cannot open it (404), by page or API', async () => {
		const cookie = await sessionCookie('events@st-aldric.test');
		const id = new URL(quoteUrl).pathname.split('/').pop();
		expect((await api(`/api/quotes/${id}`, { cookie })).status).toBe(404);
		const page = await browser.newPage();
		await signIn(page, 'events@st-aldric.test');
		await page.waitForURL(`${BASE_URL}/`);
		const response = await page.goto(quoteUrl);
		expect(response?.status()).toBe(404);
		await page.close();
	});
});

describe('the quote list and a request in feet, as the desk reads them', () => {
	it('shows coverage in feet when the request is in feet', async () => {
		const page = await openDeskRequest(browser, { event: 'Coverage in feet', from: '2032-07-10', until: '2032-07-10', levelDb: 90, distanceM: 25 });
		await page.getByLabel('Unit', { exact: true }).selectOption('ft');
		await page.getByLabel(/Audience width at that distance/).fill('100');
		await page.getByText(/\d+ ft wide/).first().waitFor(); // the results after the switch to feet
		const coverage = await page.locator('dt', { hasText: 'Coverage' }).locator('xpath=following-sibling::dd').allTextContents();
		expect(coverage.length).toBeGreaterThan(0);
		for (const text of coverage) expect(text).not.toMatch(/\d m wide/);
		expect(coverage.join(' ')).toMatch(/\d+ ft wide|all round/);
		await page.close();
	});

	it('lists quotes in the order its heading states: the last changed first', async () => {
		const cookie = await sessionCookie(SALES);
		const listed = (await api('/api/quotes', { cookie })).json as { reference: string; updatedAt: string }[];
		const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
		await signIn(page, SALES);
		await page.waitForURL(`${BASE_URL}/`);
		await page.goto(`${BASE_URL}/quotes`);
		await page.getByText('Every quote, the last changed first.').waitFor();
		const shown = await page.locator('tbody tr td:first-child a').allTextContents();
		const changed = new Map(listed.map((q) => [q.reference, q.updatedAt]));
		const times = shown.map((ref) => changed.get(ref.trim())!);
		expect(times.every(Boolean)).toBe(true);
		expect(times).toEqual([...times].sort().reverse());
		await page.close();
	});
});

describe('cancelling a quote', () => {
	it('asks for confirmation with the consequences in words, and a form post without it changes nothing', async () => {
		const sales = await sessionCookie(SALES);
		const request = { targetDb: 80, weighting: 'A', distance: 10, distanceUnit: 'm', programme: 'speech', startDate: '2032-09-12', endDate: '2032-09-12' };
		const ranked = await api('/api/evaluations', { cookie: sales, method: 'POST', body: request });
		const clients = await api('/api/clients', { cookie: sales });
		const created = await api('/api/quotes', { cookie: sales, method: 'POST', body: { clientId: clients.json[0].id, eventName: 'Cancel confirmation check', packageId: ranked.json.results[0].packageId, request } });
		expect(created.status).toBe(201);
		const url = `${BASE_URL}/quotes/${created.json.id}`;

		// Without JavaScript's help (a plain form post, no ticked box) the server refuses and nothing moves.
		const bare = await fetch(`${url}?/cancel`, { method: 'POST', redirect: 'manual', headers: { cookie: sales, origin: BASE_URL, accept: 'text/html', 'content-type': 'application/x-www-form-urlencoded' }, body: '' });
		expect(bare.status).toBe(400);
		expect(await bare.text()).toContain('Tick “Yes, cancel this quote” to confirm. Nothing has changed.');
		expect((await api(`/api/quotes/${created.json.id}`, { cookie: sales })).json.status).toBe('draft');

		const page = await browser.newPage({ viewport: { width: 390, height: 844 } });
		await signIn(page, SALES);
		await page.waitForURL(`${BASE_URL}/`);
		await page.goto(url);
		await page.getByText('Cancel quote…').click();
		const consequences = await page.getByTestId('cancel-consequences').textContent();
		expect(consequences).toContain('cancelled for good');
		expect(consequences).toContain('The client is told by e-mail.');
		await page.getByLabel('Yes, cancel this quote').check();
		await page.getByRole('button', { name: 'Cancel the quote' }).click();
		await expect.poll(() => page.getByTestId('quote-status').textContent()).toBe('Cancelled');
		await page.close();
	});
});

describe('a new organiser without an account', () => {
	it('gets a one-time sign-in link with the quote that opens it, once', async () => {
		const email = `new-organiser-${Date.now()}@example.test`;
		const sales = await sessionCookie(SALES);
		const request = { targetDb: 80, weighting: 'A', distance: 10, distanceUnit: 'm', programme: 'speech', startDate: '2032-09-05', endDate: '2032-09-05' };
		const ranked = await api('/api/evaluations', { cookie: sales, method: 'POST', body: request });
		const created = await api('/api/quotes', {
			cookie: sales,
			method: 'POST',
			body: { newClient: { name: 'Harbour Lights Fair', contactName: 'Noor Vance', email }, eventName: 'Harbour fair welcome', packageId: ranked.json.results[0].packageId, request }
		});
		expect(created.status).toBe(201);
		expect((await api(`/api/quotes/${created.json.id}/actions`, { cookie: sales, method: 'POST', body: { action: 'send' } })).status).toBe(200);
		const mail = await waitForMail({ to: email, subjectIncludes: 'Harbour fair welcome', timeoutMs: 10_000 });
		const link = mail.text.match(/http:\/\/\S+\/signin\/link\/[\w-]+/)![0];

		const page = await browser.newPage();
		await page.goto(link);
		await page.getByRole('button', { name: 'Continue to my quote' }).click();
		await page.waitForURL(`${BASE_URL}/quotes/${created.json.id}`);
		await page.getByRole('heading', { name: 'Harbour fair welcome' }).waitFor();
		await page.context().clearCookies();
		await page.goto(link);
		await page.getByRole('heading', { name: 'This link has expired' }).waitFor();
		await page.close();
	});
});

describe('POST /api/evaluations', () => {
	const body = {
		targetDb: 98, weighting: 'A', distance: 100, distanceUnit: 'ft', programme: 'pop-rock',
		startDate: '2032-08-01', endDate: '2032-08-01', boundary: { distance: 800, limitDb: 75, weighting: 'C' }
	};

	it('ranks packages clear → tight → over the limit → short for sales and admin; 403 for others; 401 signed out', async () => {
		const sales = await sessionCookie(SALES);
		const result = await api('/api/evaluations', { cookie: sales, method: 'POST', body });
		expect(result.status).toBe(200);
		const order = { clear: 0, tight: 1, 'over-limit': 2, short: 3 } as Record<string, number>;
		const verdicts = result.json.results.map((r: { outcome: string }) => order[r.outcome]);
		expect(verdicts).toEqual([...verdicts].sort((a, b) => a - b));
		for (const r of result.json.results) {
			expect(Number.isInteger(r.price.totalMinor)).toBe(true);
			if (r.evaluation) expect(r.evaluation.boundary.weighting).toBe('C');
		}
		expect((await api('/api/evaluations', { cookie: await sessionCookie(WAREHOUSE), method: 'POST', body })).status).toBe(403);
		expect((await api('/api/evaluations', { cookie: await sessionCookie(CLIENT_EMAIL), method: 'POST', body })).status).toBe(403);
		expect((await api('/api/evaluations', { method: 'POST', body })).status).toBe(401);
	});

	it('answers bad input with 400/422 and field errors, never a 500', async () => {
		const cookie = await sessionCookie(SALES);
		const bad = await api('/api/evaluations', {
			cookie,
			method: 'POST',
			body: { ...body, targetDb: 'loud', distance: -5, programme: 'polka', startDate: '2032-02-30', boundary: { distance: 1, limitDb: 500, weighting: 'Q' } }
		});
		expect(bad.status).toBe(422);
		expect(Object.keys(bad.json.errors)).toEqual(expect.arrayContaining(['targetDb', 'distance', 'startDate', 'boundary.limitDb', 'boundary.weighting']));
		const unknownProgramme = await api('/api/evaluations', { cookie, method: 'POST', body: { ...body, programme: 'polka' } });
		expect(unknownProgramme.status).toBe(422);
		expect(unknownProgramme.json.errors.programme).toBeDefined();
		expect((await api('/api/evaluations', { cookie, method: 'POST', body: 'not json' })).status).toBe(400);
	});
});

import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { waitForMail } from '../fakes/mailbox';
import { BASE_URL, launchBrowser, screenshot, signIn } from './browser';
import { api, sessionCookie } from './http';
import { ADMIN, SALES } from '../helpers/demo-accounts';

let browser: Browser;
beforeAll(async () => {
	browser = await launchBrowser();
});
afterAll(async () => {
	await browser?.close();
});

const CLIENT = 'events@st-aldric.test';

/** A sent quote for the school's graduation, made through the API as the desk would. */
async function sentQuote(): Promise<number> {
	const sales = await sessionCookie(SALES);
	const request = {
		targetDb: 85, weighting: 'A', distance: 15, distanceUnit: 'm', programme: 'speech',
		startDate: '2033-06-20', endDate: '2033-06-20'
	};
	const ranked = await api('/api/evaluations', { cookie: sales, method: 'POST', body: request });
	const pick = ranked.json.results.find((r: { verdict: string }) => r.verdict !== 'short') ?? ranked.json.results[0];
	const quotes = await api('/api/quotes', { cookie: await sessionCookie(CLIENT) });
	const clientId = quotes.json[0]?.clientId;
	const list = await api('/api/users', { cookie: await sessionCookie(ADMIN) });
	const schoolClientId = clientId ?? list.json.find((u: { email: string }) => u.email === CLIENT).clientId;
	const created = await api('/api/quotes', {
		cookie: sales,
		method: 'POST',
		body: { clientId: schoolClientId, eventName: 'Graduation, browser payment test', packageId: pick.packageId, request }
	});
	expect(created.status).toBe(201);
	const sent = await api(`/api/quotes/${created.json.id}/actions`, { cookie: sales, method: 'POST', body: { action: 'send' } });
	expect(sent.status).toBe(200);
	return created.json.id;
}

describe('the client accepts and pays the deposit', () => {
	it('accept → pay on the hosted page → deposit paid, booking confirmed, confirmation e-mail', async () => {
		const id = await sentQuote();
		const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
		await signIn(page, CLIENT);
		await page.waitForURL(`${BASE_URL}/`);
		await page.goto(`${BASE_URL}/quotes/${id}`);
		await page.getByLabel(/accept them/).check();
		await page.getByRole('button', { name: 'Accept this quote' }).click();
		await page.getByRole('link', { name: 'Pay the deposit online' }).click();
		await page.getByText(/test stand-in/i).first().waitFor();
		const since = new Date();
		await page.getByLabel(/card number/i).fill('4242 4242 4242 4242');
		await page.getByLabel(/expiry/i).fill('12/40');
		await page.getByLabel(/cvc/i).fill('123');
		await page.getByRole('button', { name: /pay/i }).click();
		await page.getByRole('link', { name: /back|return/i }).first().click();
		await page.waitForURL(`${BASE_URL}/quotes/${id}`);

		// The signed webhook arrives moments later; the page shows it after a reload.
		for (let i = 0; i < 40; i++) {
			const status = await page.getByTestId('quote-status').textContent();
			if (status === 'Booking confirmed') break;
			await page.waitForTimeout(250);
			await page.reload();
		}
		await expect(page.getByTestId('quote-status').textContent()).resolves.toBe('Booking confirmed');
		await expect(page.getByTestId('invoice-status-deposit').textContent()).resolves.toMatch(/Paid/);
		await screenshot(page, 'quote-paid-1280');
		const mail = await waitForMail({ to: CLIENT, subjectIncludes: 'Booking confirmed', since, timeoutMs: 10_000 });
		expect(mail.text).toContain('Graduation, browser payment test');
		await page.close();
	});
});

describe('the webhook route', () => {
	it('refuses a missing or wrong signature with 400 and changes nothing', async () => {
		const body = JSON.stringify({ id: 'evt_forged', type: 'invoice.paid', data: { object: { id: 'in_x' } } });
		const missing = await fetch(`${BASE_URL}/api/webhooks/stripe`, { method: 'POST', headers: { 'content-type': 'application/json' }, body });
		expect(missing.status).toBe(400);
		const forged = await fetch(`${BASE_URL}/api/webhooks/stripe`, {
			method: 'POST',
			headers: { 'content-type': 'application/json', 'stripe-signature': `t=${Math.floor(Date.now() / 1000)},v1=${'0'.repeat(64)}` },
			body
		});
		expect(forged.status).toBe(400);
		expect((await forged.json()).message).toMatch(/signature/i);
	});
});

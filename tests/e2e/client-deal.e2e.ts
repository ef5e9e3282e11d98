/**
 * The client's side of the deal in the browser: in by link, a password of their own, a new link from
 * the sign-in page, accepting with terms (the desk's inbox is told), and declining (back to the desk).
 */
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CompanySettings } from '../../src/lib/server/db/models';
import { waitForMail } from '../fakes/mailbox';
import { useTestDatabase } from '../helpers/db';
import { linkIn, sentQuoteForNewClient, tag, SALES } from '../helpers/deal';
import { BASE_URL, launchBrowser, screenshot, signIn } from './browser';
import { api, sessionCookie } from './http';

useTestDatabase();
let browser: Browser;
const deskInbox = `desk-${tag()}@example.test`;
let previousDesk: string | null = null;

beforeAll(async () => {
	browser = await launchBrowser();
	// The desk's own address for this file; the app reads settings through a 5-second cache.
	const settings = await CompanySettings.findByPk(1);
	previousDesk = settings?.salesDeskEmail ?? null;
	await CompanySettings.update({ salesDeskEmail: deskInbox }, { where: { id: 1 } });
	await new Promise((r) => setTimeout(r, 5500));
});
afterAll(async () => {
	await CompanySettings.update({ salesDeskEmail: previousDesk }, { where: { id: 1 } });
	await browser?.close();
});

/** Opens the e-mailed link and presses its button; lands where the link points. */
async function openLink(page: Page, link: string): Promise<void> {
	await page.goto(link);
	await page.getByRole('button', { name: /Continue/ }).click();
	await page.waitForURL((url) => !url.pathname.startsWith('/signin'));
}

describe('getting back in', () => {
	it('a new client signs in by the quote e-mail’s link, sets a password, signs out and back in with it', async () => {
		const { id, email } = await sentQuoteForNewClient('Password first');
		const mail = await waitForMail({ to: email, subjectIncludes: 'Quote' });
		const page = await browser.newPage({ viewport: { width: 390, height: 844 } });
		await openLink(page, linkIn(mail.text));
		expect(new URL(page.url()).pathname).toBe(`/quotes/${id}`);
		await page.getByRole('link', { name: 'Choose a password' }).click();
		await page.getByLabel('New password').fill('riverside-lanterns-42');
		await page.getByLabel('The same again').fill('riverside-lanterns-42');
		await page.getByRole('button', { name: 'Save password' }).click();
		await page.getByText('Password saved').waitFor();
		await screenshot(page, 'account-password-client-390');

		await page.getByRole('button', { name: 'Menu' }).click();
		await page.locator('#phone-menu').getByRole('button', { name: 'Sign out' }).click();
		await page.waitForURL((url) => url.pathname.startsWith('/signin'));
		await signIn(page, email, 'riverside-lanterns-42');
		await page.waitForURL(`${BASE_URL}/`);
		await page.getByRole('heading', { name: /Good to see you/ }).waitFor();
		await page.close();
	});

	it('another client asks for a new link on the sign-in page and uses it', async () => {
		const { email } = await sentQuoteForNewClient('New link');
		const page = await browser.newPage();
		await page.goto(`${BASE_URL}/signin`);
		await page.getByLabel('E-mail').fill(email);
		const since = new Date();
		await page.getByRole('button', { name: 'E-mail me a sign-in link' }).click();
		await page.getByText(`If ${email} has a client account, a sign-in link is on its way`).waitFor();
		const mail = await waitForMail({ to: email, subjectIncludes: 'sign-in link', since });
		await openLink(page, linkIn(mail.text));
		await page.getByRole('heading', { name: /Good to see you/ }).waitFor();
		await page.close();
	});
});

describe('the client answers the quote', () => {
	it('accepts with the terms; paying the deposit is the next step and the desk’s inbox is told', async () => {
		const { id, email } = await sentQuoteForNewClient('Accept with terms');
		const mail = await waitForMail({ to: email, subjectIncludes: 'Quote' });
		const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
		await openLink(page, linkIn(mail.text));
		await page.getByTestId('answer-terms').getByText(/Cancellation:/).waitFor();
		expect(await page.getByTestId('answer-equipment').locator('li').count()).toBeGreaterThan(0);
		const accept = page.getByRole('button', { name: 'Accept this quote' });
		expect(await accept.isDisabled()).toBe(true);
		await page.getByLabel(/accept them/).check();
		const since = new Date();
		await accept.click();
		await page.getByRole('link', { name: 'Pay the deposit now' }).waitFor();
		await page.getByTestId('acceptance').getByText(/Accepted by Rowan/).waitFor();
		await screenshot(page, 'quote-accepted-client-1280');

		const reference = (await api(`/api/quotes/${id}`, { cookie: await sessionCookie(SALES) })).json.reference as string;
		const notice = await waitForMail({ to: deskInbox, subjectIncludes: `accepted the quote: ${reference}`, since, timeoutMs: 10_000 });
		expect(notice.text).toContain(encodeURIComponent(`/quotes/${id}`));
		const overview = await (await fetch(`${BASE_URL}/`, { headers: { cookie: await sessionCookie(SALES), accept: 'text/html' } })).text();
		expect(overview).toContain(reference);
		await page.close();
	});

	it('declines with a message; the quote is back in the desk’s list and the desk is told', async () => {
		const { id, email } = await sentQuoteForNewClient('Decline');
		const mail = await waitForMail({ to: email, subjectIncludes: 'Quote' });
		const page = await browser.newPage();
		await openLink(page, linkIn(mail.text));
		await page.getByText('Decline', { exact: true }).click();
		await page.getByLabel(/Anything we should know/).fill('We found a smaller venue.');
		const since = new Date();
		await page.getByRole('button', { name: 'Decline the quote' }).click();
		await page.getByText('The hire desk has been told').waitFor();
		await page.close();

		const sales = await sessionCookie(SALES);
		const quote = (await api(`/api/quotes/${id}`, { cookie: sales })).json;
		expect(quote.status).toBe('draft');
		expect(quote.clientResponse).toBe('declined');
		expect(quote.clientMessage).toBe('We found a smaller venue.');
		await waitForMail({ to: deskInbox, subjectIncludes: `declined the quote: ${quote.reference}`, since, timeoutMs: 10_000 });

		const desk = await browser.newPage();
		await signIn(desk, SALES);
		await desk.waitForURL(`${BASE_URL}/`);
		await desk.goto(`${BASE_URL}/quotes`);
		const row = desk.getByRole('row').filter({ hasText: quote.reference });
		await row.getByText('declined by client').waitFor();
		await desk.close();
	});
});

/** The sales desk's first steps in the browser, shared by the end-to-end tests of the quote desk. */
import type { Browser, Page } from 'playwright-core';
import { BASE_URL, signIn } from './browser';
import { SALES } from '../helpers/demo-accounts';

/** The client the desk tests quote for, and the contact who receives and answers the quote. */
export const CLIENT_NAME = 'Millbrook Riverside Food Festival';
export const CLIENT_EMAIL = 'organiser@millbrook-riverside.test';

export interface DeskRequest {
	event: string;
	from: string;
	until: string;
	levelDb: number;
	distanceM: number;
	/** A programme profile's key; left out, the form's default. */
	programme?: string;
}

/**
 * Signs in as sales (at a desk-sized window unless told), fills a new quote's request for the test
 * client (event, hire dates, level and distance at the position, programme) and waits until the
 * packages have been checked.
 */
export async function openDeskRequest(browser: Browser, request: DeskRequest, viewport = { width: 1280, height: 900 }): Promise<Page> {
	const page = await browser.newPage({ viewport });
	await signIn(page, SALES);
	await page.waitForURL(`${BASE_URL}/`);
	await page.goto(`${BASE_URL}/quotes/new`);
	await page.getByLabel('Client', { exact: true }).selectOption({ label: CLIENT_NAME });
	await page.getByLabel('Event', { exact: true }).fill(request.event);
	await page.getByLabel('Hire from').fill(request.from);
	await page.getByLabel('Hire until').fill(request.until);
	await page.getByLabel(/Level at the position/).fill(String(request.levelDb));
	await page.getByLabel(/Distance from the system to the position/).fill(String(request.distanceM));
	if (request.programme) await page.getByLabel('Programme', { exact: true }).selectOption(request.programme);
	await page.getByText(/packages checked/).waitFor();
	return page;
}

/** Saves the request page's quote with the chosen system and sends it; answers the quote's URL. */
export async function saveAndSendQuoteWith(page: Page, systemName: string): Promise<string> {
	await page.getByRole('button', { name: `Save quote with ${systemName}` }).click();
	await page.waitForURL(/\/quotes\/\d+$/);
	const quoteUrl = page.url();
	await page.getByText(systemName).first().waitFor();
	await page.getByRole('button', { name: 'Send to client' }).click();
	await page.getByText('Sent: the client has the quote by e-mail.').waitFor();
	return quoteUrl;
}

/** Asks for suggestions from stock, waits for the search to finish and picks the first (cheapest). */
export async function pickFirstSuggestion(page: Page): Promise<void> {
	await page.getByRole('button', { name: 'Suggest systems from stock' }).click();
	await page.getByText(/^Checked \d+ systems/).waitFor({ timeout: 30_000 });
	await page.getByTestId('pick-system').first().check();
}

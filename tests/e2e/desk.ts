/** The sales desk's first steps in the browser, shared by the end-to-end tests of the quote desk. */
import type { Browser, Page } from 'playwright-core';
import { BASE_URL, signIn } from './browser';

/** The client the desk tests quote for, and the contact who receives and answers the quote. */
export const CLIENT_NAME = 'Millbrook Riverside Food Festival';
export const CLIENT_EMAIL = 'organiser@millbrook-riverside.test';

export interface DeskRequest {
	event: string;
	from: string;
	until: string;
	levelDb: number;
	distanceM: number;
}

/**
 * Signs in as sales at a desk-sized window, fills a new quote's request for the test client (event,
 * hire dates, level and distance at the position) and waits until the packages have been checked.
 */
export async function openDeskRequest(browser: Browser, request: DeskRequest): Promise<Page> {
	const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
	await signIn(page, 'sales@kestrel-yard.test');
	await page.waitForURL(`${BASE_URL}/`);
	await page.goto(`${BASE_URL}/quotes/new`);
	await page.getByLabel('Client', { exact: true }).selectOption({ label: CLIENT_NAME });
	await page.getByLabel('Event', { exact: true }).fill(request.event);
	await page.getByLabel('Hire from').fill(request.from);
	await page.getByLabel('Hire until').fill(request.until);
	await page.getByLabel(/Level at the position/).fill(String(request.levelDb));
	await page.getByLabel(/Distance from the system to the position/).fill(String(request.distanceM));
	await page.getByText(/packages checked/).waitFor();
	return page;
}

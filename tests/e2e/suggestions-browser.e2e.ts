import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { BASE_URL, launchBrowser, screenshot, signIn } from './browser';
import { CLIENT_EMAIL, openDeskRequest, pickFirstSuggestion, saveAndSendQuoteWith } from './desk';

let browser: Browser;
beforeAll(async () => {
	browser = await launchBrowser();
});
afterAll(async () => {
	await browser?.close();
});

describe('suggesting a system from stock, end to end', () => {
	let quoteUrl = '';
	let systemName = '';

	it('sales asks for suggestions, picks one, and saves and sends the quote with it', async () => {
		const page = await openDeskRequest(browser, { event: 'Riverside talks, suggested system', from: '2032-09-03', until: '2032-09-04', levelDb: 98, distanceM: 30 });

		await pickFirstSuggestion(page);
		systemName = (await page.getByTestId('chosen-system').locator('strong').textContent())!;
		expect(systemName).toMatch(/ × /);
		await screenshot(page, 'quote-suggested-1280');

		quoteUrl = await saveAndSendQuoteWith(page, systemName);
		await page.close();
	}, 90_000);

	it('the client sees the composed system’s lines on the quote document', async () => {
		const page = await browser.newPage({ viewport: { width: 390, height: 844 } });
		await signIn(page, CLIENT_EMAIL);
		await page.waitForURL(`${BASE_URL}/`); // signed in before the document is asked for
		await page.goto(`${quoteUrl}/print`);
		const loudspeaker = systemName.split(' + ')[0].replace(/^[\d ×]+/, '').trim();
		await page.getByText(loudspeaker).first().waitFor();
		expect(await page.textContent('body')).toContain(loudspeaker);
		await page.close();
	}, 60_000);
});

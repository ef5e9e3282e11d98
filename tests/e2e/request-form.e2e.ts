/** The desk's request form: units convert, "Hire until" follows "Hire from", the desk's pick stays and is marked. */
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { BASE_URL, launchBrowser, signIn } from './browser';
import { SALES } from '../helpers/demo-accounts';

let browser: Browser;
beforeAll(async () => {
	browser = await launchBrowser();
});
afterAll(async () => {
	await browser?.close();
});

describe('the request form', () => {
	it('converts every distance between m and ft, moves Hire until with Hire from, and keeps the desk’s pick', async () => {
		const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
		await signIn(page, SALES);
		await page.waitForURL(`${BASE_URL}/`);
		await page.goto(`${BASE_URL}/quotes/new`);

		await page.getByLabel('Hire until').fill('2041-05-02');
		await page.getByLabel('Hire from').fill('2041-05-09');
		await page.getByLabel('Hire from').dispatchEvent('change');
		await expect(page.getByLabel('Hire until').inputValue()).resolves.toBe('2041-05-09');
		await page.getByLabel('Hire until').fill('2041-05-11');
		await page.getByLabel('Hire from').fill('2041-05-10');
		await page.getByLabel('Hire from').dispatchEvent('change');
		await expect(page.getByLabel('Hire until').inputValue()).resolves.toBe('2041-05-11');

		// 1 ft = 0.3048 m exactly; shown to 0.1.
		await page.getByLabel(/Distance from the system to the position/).fill('30');
		await page.getByLabel(/Audience width/).fill('20');
		await page.getByLabel('Unit', { exact: true }).selectOption('ft');
		await expect(page.getByLabel(/Distance from the system to the position/).inputValue()).resolves.toBe('98.4');
		await expect(page.getByLabel(/Audience width/).inputValue()).resolves.toBe('65.6');
		await page.getByLabel('Unit', { exact: true }).selectOption('m');
		await expect(page.getByLabel(/Distance from the system to the position/).inputValue()).resolves.toBe('30');

		await page.getByText(/\d+ packages checked/).waitFor();
		const radios = page.locator('input[type="radio"][name="packageId"]');
		expect(await radios.count()).toBeGreaterThan(1);
		await expect(radios.first().isChecked()).resolves.toBe(true);
		const second = await radios.nth(1).inputValue();
		await radios.nth(1).check();
		await page.getByTestId('not-best').waitFor();
		await page.getByLabel(/Level at the position/).fill('93');
		await page.getByText(/\d+ packages checked/).waitFor();
		await expect(page.locator('input[type="radio"][name="packageId"]:checked').inputValue()).resolves.toBe(second);
		await page.close();
	});
});

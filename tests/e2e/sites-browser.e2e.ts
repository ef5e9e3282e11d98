/**
 * Sites in the browser: sales makes a site (a receiver without a limit is refused beside its field),
 * and moves the demo festival's fence receiver from behind the stage to in front of it, seeing the
 * predictions, the receiver that binds and the outcome change without a reload.
 */
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { BASE_URL, launchBrowser, screenshot, signIn } from './browser';
import { SALES } from '../helpers/demo-accounts';

let browser: Browser;
beforeAll(async () => {
	browser = await launchBrowser();
});
afterAll(async () => {
	await browser?.close();
});

async function salesPage(): Promise<Page> {
	const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
	await signIn(page, SALES);
	await page.waitForURL(`${BASE_URL}/`);
	return page;
}

describe('sites in the browser', () => {
	it('sales makes a site; a receiver without a limit is refused beside its field', async () => {
		const page = await salesPage();
		await page.goto(`${BASE_URL}/sites/new`);
		await page.getByLabel('Name', { exact: true }).first().fill(`Browser test field ${Date.now()}`);
		await page.getByRole('button', { name: 'Add a receiver' }).click();
		const receiver = page.getByRole('group', { name: /Receiver 1/ });
		await receiver.getByLabel('Limit (dB)').fill('');
		await page.getByRole('button', { name: 'Save the site' }).click();
		await receiver.getByText('Enter the receiver’s limit in dB').waitFor();

		await receiver.getByLabel('Limit (dB)').fill('60');
		await page.getByRole('button', { name: 'Save the site' }).click();
		await page.waitForURL(/\/sites\/\d+$/);
		await page.getByRole('heading', { name: /Browser test field/ }).waitFor();
		await page.close();
	});

	it('moving the fence from behind the stage to in front changes the prediction, the binding receiver and the outcome', async () => {
		const page = await salesPage();
		await page.goto(`${BASE_URL}/sites`);
		await page.getByRole('link', { name: /Riverside Park/ }).click();
		await page.waitForURL(/\/sites\/\d+$/);
		const outcome = page.getByTestId('site-outcome');
		await outcome.waitFor();

		// Drive the first package that can reach the level, just below what keeps every receiver within its limit.
		const packages = await page.locator('#check-package').locator('option').allTextContents();
		let fitted = false;
		for (const name of packages) {
			await page.locator('#check-package').selectOption({ label: name });
			const ceiling = Number((await page.getByTestId('max-target').textContent())!.match(/-?[\d.]+/)![0]);
			await page.locator('#check-target').fill(String(Math.floor(ceiling) - 1));
			if (!/Short/.test((await outcome.textContent()) ?? '')) {
				fitted = true;
				break;
			}
		}
		expect(fitted).toBe(true);
		const before = {
			outcome: (await outcome.locator('span').first().textContent())!.trim(),
			binding: (await page.getByTestId('binding-receiver').textContent())!.trim(),
			table: await page.getByTestId('receiver-predictions').textContent()
		};
		expect(before.outcome).not.toMatch(/Over the limit/);
		expect(before.binding).not.toBe('Park fence');
		await screenshot(page, 'site-fence-behind-1280');

		const plan = page.getByRole('group', { name: /^Plan of/ });
		const planBefore = await plan.innerHTML();
		// In front of the stage: the system aims east, so move the fence 65 m east and 30 m north on the plan
		// with the keyboard (10 m per shift+arrow, 1 m per arrow).
		const marker = page.getByTestId('plan-receiver').filter({ hasText: 'Park fence' });
		await marker.focus();
		for (let i = 0; i < 6; i++) await page.keyboard.press('Shift+ArrowRight');
		for (let i = 0; i < 5; i++) await page.keyboard.press('ArrowRight');
		for (let i = 0; i < 3; i++) await page.keyboard.press('Shift+ArrowUp');
		await expect.poll(async () => page.locator('form').getByRole('group', { name: /Park fence/ }).getByLabel(/^East/).inputValue()).toBe('25');

		await expect.poll(async () => (await page.getByTestId('binding-receiver').textContent())?.trim()).toBe('Park fence');
		await expect.poll(async () => (await outcome.textContent()) ?? '').toMatch(/Over the limit/);
		expect(await page.getByTestId('receiver-predictions').textContent()).not.toBe(before.table);
		// The plan redraws with the fence in its new place, the level map still on it.
		await expect.poll(async () => plan.innerHTML()).not.toBe(planBefore);
		await page.getByTestId('level-map').waitFor();
		await screenshot(page, 'site-fence-in-front-1280');
		await page.close();
	});
});

import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { BASE_URL, launchBrowser, screenshot, signIn } from './browser';
import { ADMIN, DEMO_PASSWORD, SALES, WAREHOUSE } from '../helpers/demo-accounts';

let browser: Browser;
beforeAll(async () => {
	browser = await launchBrowser();
});
afterAll(async () => {
	await browser?.close();
});

const staff = [
	{ role: 'admin', email: ADMIN, sees: ['Overview', 'Users'] },
	{ role: 'warehouse', email: WAREHOUSE, sees: ['Overview'], hidden: ['Users'] },
	{ role: 'sales', email: SALES, sees: ['Overview'], hidden: ['Users'] }
];

describe('sign-in and navigation by role', () => {
	for (const person of staff) {
		it(`${person.role} signs in and sees their own navigation`, async () => {
			const page = await browser.newPage({ viewport: { width: 1280, height: 800 } });
			await signIn(page, person.email);
			await page.waitForURL(`${BASE_URL}/`);
			const nav = page.getByTestId('main-nav');
			for (const label of person.sees) {
				await expect(nav.getByRole('link', { name: label, exact: true }).isVisible()).resolves.toBe(true);
			}
			for (const label of person.hidden ?? []) {
				await expect(nav.getByRole('link', { name: label, exact: true }).count()).resolves.toBe(0);
			}
			await screenshot(page, `overview-${person.role}-1280`);
			await page.close();
		});
	}

	it('a wrong password and an unknown e-mail get the same calm message', async () => {
		const page = await browser.newPage();
		await signIn(page, SALES, 'not-the-password');
		const wrongPassword = await page.getByRole('alert').textContent();
		await signIn(page, 'nobody@kestrel-yard.test', 'not-the-password');
		const unknownEmail = await page.getByRole('alert').textContent();
		expect(wrongPassword?.trim()).toBe(unknownEmail?.trim());
		expect(wrongPassword).toMatch(/do not match an account/);
		expect(page.url()).toContain('/signin');
		await page.close();
	});

	it('an empty form shows field-level messages', async () => {
		const page = await browser.newPage();
		await page.goto(`${BASE_URL}/signin`);
		await page.getByRole('button', { name: 'Sign in' }).click();
		await page.getByText('Enter the e-mail address you sign in with').waitFor();
		await page.close();
	});

	it('a signed-out visit to a page goes to sign-in and comes back after', async () => {
		const page = await browser.newPage();
		await page.goto(`${BASE_URL}/admin/users`);
		expect(new URL(page.url()).pathname).toBe('/signin');
		await page.getByLabel('E-mail').fill(ADMIN);
		await page.getByLabel('Password').fill(DEMO_PASSWORD);
		await page.getByRole('button', { name: 'Sign in' }).click();
		await page.waitForURL(`${BASE_URL}/admin/users`);
		await page.getByRole('heading', { name: 'Users' }).waitFor();
		await page.close();
	});

	it('the shell works on a phone: menu button, no sideways scroll', async () => {
		const page = await browser.newPage({ viewport: { width: 390, height: 844 } });
		await signIn(page, ADMIN);
		await page.waitForURL(`${BASE_URL}/`);
		await page.getByRole('button', { name: 'Menu' }).click();
		await page.locator('#phone-menu').getByRole('link', { name: 'Users' }).waitFor();
		const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
		expect(overflow).toBeLessThanOrEqual(0);
		await screenshot(page, 'overview-admin-390');
		await page.close();
	});
});

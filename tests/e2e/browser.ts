import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { chromium, type Browser, type Page } from 'playwright-core';
import { DEMO_PASSWORD } from '../helpers/demo-accounts';

export { DEMO_PASSWORD };
export const BASE_URL = process.env.ORIGIN ?? 'http://127.0.0.1:3100';

/** Debian's chromium, with the flags that work as root on a machine without outside network.
 * Playwright gives every launch a fresh temporary profile. */
export async function launchBrowser(extraArgs: string[] = []): Promise<Browser> {
	return chromium.launch({
		executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
		args: [
			'--no-sandbox',
			'--disable-gpu',
			'--disable-quic',
			'--no-first-run',
			'--disable-background-networking',
			'--disable-component-update',
			'--disable-sync',
			...extraArgs
		]
	});
}

export async function signIn(page: Page, email: string, password = DEMO_PASSWORD): Promise<void> {
	await page.goto(`${BASE_URL}/signin`);
	await page.getByLabel('E-mail').fill(email);
	await page.getByLabel('Password').fill(password);
	await page.getByRole('button', { name: 'Sign in' }).click();
}

/** Screenshots land in tests/e2e/screenshots/ (ignored by git) for people to look at. */
export async function screenshot(page: Page, name: string): Promise<void> {
	const dir = path.resolve('tests/e2e/screenshots');
	mkdirSync(dir, { recursive: true });
	await page.screenshot({ path: path.join(dir, `${name}.png`), fullPage: true });
}

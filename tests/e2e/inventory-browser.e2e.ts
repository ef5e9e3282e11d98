import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { BASE_URL, launchBrowser, screenshot, signIn } from './browser';
import { api, sessionCookie } from './http';
import { amplifierBody, loudspeakerBody } from './inventory-helpers';
import { AMPLIFIER_CSV_COLUMNS } from '../../src/lib/inventory/csv';
import { SALES, WAREHOUSE } from '../helpers/demo-accounts';

let browser: Browser;
let modelId: number;
let tableModelId: number;
// A test table (not demo data): seven angles, two bands.
const table = { anglesDeg: [0, 30, 60, 90, 120, 150, 180], bandsDb: { '125': [0, 0, 1, 2, 3, 4, 5], '1000': [0, 2, 6, 11, 14, 16, 17] } };
beforeAll(async () => {
	browser = await launchBrowser();
	const cookie = await sessionCookie(WAREHOUSE);
	const created = await api('/api/loudspeakers', { cookie, method: 'POST', body: loudspeakerBody({ sensitivityDb: 96 }) });
	modelId = created.json.id;
	const withTable = await api('/api/loudspeakers', { cookie, method: 'POST', body: loudspeakerBody({ directivity: table }) });
	tableModelId = withTable.json.id;
});
afterAll(async () => {
	await browser?.close();
});

describe('inventory in the browser', () => {
	it('a warehouse user edits a loudspeaker’s sensitivity and sees it in the spec history', async () => {
		const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
		await signIn(page, WAREHOUSE);
		await page.waitForURL(`${BASE_URL}/`);
		await page.goto(`${BASE_URL}/inventory/loudspeakers/${modelId}`);
		await page.getByRole('link', { name: 'Edit specification' }).click();
		await page.waitForURL(`${BASE_URL}/inventory/loudspeakers/${modelId}/edit`);

		// A value out of range is refused beside its field, and nothing is saved.
		await page.getByLabel('Sensitivity (on axis, 1 m)').fill('150');
		await page.getByRole('button', { name: 'Save changes' }).click();
		await page.getByText('At most 120 dB').waitFor();

		await page.getByLabel('Sensitivity (on axis, 1 m)').fill('98.5');
		await page.getByRole('button', { name: 'Save changes' }).click();
		await page.waitForURL(`${BASE_URL}/inventory/loudspeakers/${modelId}`);
		const history = page.getByTestId('spec-history');
		const row = history.getByRole('row').filter({ hasText: 'Sensitivity' });
		await row.waitFor();
		await expect(row.textContent()).resolves.toMatch(/Sam Ilunga.*Sensitivity \(dB\).*96\s*→\s*98\.5/s);
		await screenshot(page, 'inventory-loudspeaker-history-1280');
		await page.close();
	});

	it('shows day rates and their changes as money with the currency, never minor units', async () => {
		const cookie = await sessionCookie(WAREHOUSE);
		const changed = await api(`/api/loudspeakers/${modelId}`, { cookie, method: 'PATCH', body: { dayRateMinor: 3250 } });
		expect(changed.status).toBe(200);
		const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
		await signIn(page, WAREHOUSE);
		await page.waitForURL(`${BASE_URL}/`);
		await page.goto(`${BASE_URL}/inventory/loudspeakers/${modelId}`);
		const row = page.getByTestId('spec-history').getByRole('row').filter({ hasText: 'Day rate' });
		await expect(row.textContent()).resolves.toMatch(/£20\.00\s*→\s*£32\.50/);
		await expect(row.textContent()).resolves.not.toMatch(/minor units|\b2000\b/);
		await page.goto(`${BASE_URL}/inventory/loudspeakers`);
		const listed = await page.getByRole('row').filter({ hasText: changed.json.name }).textContent();
		expect(listed).toContain('£32.50');
		await page.close();
	});

	it('a warehouse user edits one directivity cell with the keyboard and sees it in the spec history', async () => {
		const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
		await signIn(page, WAREHOUSE);
		await page.waitForURL(`${BASE_URL}/`);
		await page.goto(`${BASE_URL}/inventory/loudspeakers/${tableModelId}/edit`);
		// Arrow keys move between cells: from 125 Hz at 60° down to 1 kHz at 60°.
		await page.getByLabel('125 Hz at 60°, dB').click();
		await page.keyboard.press('ArrowDown');
		expect(await page.evaluate(() => document.activeElement?.getAttribute('aria-label'))).toBe('1 kHz at 60°, dB');
		await page.keyboard.type('7.5');
		await page.getByRole('button', { name: 'Save changes' }).click();
		await page.waitForURL(`${BASE_URL}/inventory/loudspeakers/${tableModelId}`);
		const row = page.getByTestId('spec-history').getByRole('row').filter({ hasText: 'Directivity (polar data)' });
		await row.waitFor();
		await expect(row.textContent()).resolves.toMatch(/1 kHz: 0 2 6 11 14 16 17.*→.*1 kHz: 0 2 7\.5 11 14 16 17/s);
		await expect(page.getByTestId('directivity-table').textContent()).resolves.toContain('7.5');
		await screenshot(page, 'inventory-directivity-history-1280');
		await page.close();
	});

	it('on a phone the directivity grid scrolls inside its own box and says so', async () => {
		const page = await browser.newPage({ viewport: { width: 390, height: 844 } });
		await signIn(page, WAREHOUSE);
		await page.waitForURL(`${BASE_URL}/`);
		await page.goto(`${BASE_URL}/inventory/loudspeakers/${tableModelId}/edit`);
		const grid = page.getByRole('region', { name: 'Directivity (polar data), a table you can scroll sideways' });
		await grid.waitFor();
		const sizes = await grid.evaluate((el) => ({ scroll: el.scrollWidth, client: el.clientWidth }));
		expect(sizes.scroll).toBeGreaterThan(sizes.client);
		await page.getByText('Scroll sideways for more angles →').waitFor();
		expect(await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth)).toBe(0);
		await page.getByText('Scroll sideways for more angles →').scrollIntoViewIfNeeded();
		await screenshot(page, 'inventory-directivity-grid-390');
		await page.close();
	});

	it('the CSV import preview shows old → new as money, by the spreadsheet’s row numbers, for a file with the old headers', async () => {
		const cookie = await sessionCookie(WAREHOUSE);
		const amp = (await api('/api/amplifiers', { cookie, method: 'POST', body: amplifierBody() })).json;
		const row = (dayRate: number) => `${amp.name},${amp.maker},2,800,1400,,4,2,10,${dayRate},120000,3,`;
		const csv = `${AMPLIFIER_CSV_COLUMNS.join(',')}\r\n${row(3100)}\r\n`;
		const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
		await signIn(page, WAREHOUSE);
		await page.waitForURL(`${BASE_URL}/`);
		await page.goto(`${BASE_URL}/inventory/import`);
		await page.getByLabel('Which models').selectOption('amplifiers');
		await page.getByLabel(/CSV file/).setInputFiles({ name: 'amps.csv', mimeType: 'text/csv', buffer: Buffer.from(csv) });
		await page.getByRole('button', { name: 'Check the file' }).click();
		const preview = page.getByTestId('import-preview');
		await preview.waitFor();
		const line = preview.getByRole('row').filter({ hasText: amp.name });
		expect(await line.locator('td').first().textContent()).toMatch(/^2/); // the header is row 1
		expect(await line.getByTestId('import-changes').textContent()).toMatch(/Day rate:\s*£25\.00\s*→\s*£31\.00/);
		await page.close();
	});

	it('sales sees the model but no edit controls', async () => {
		const page = await browser.newPage();
		await signIn(page, SALES);
		await page.waitForURL(`${BASE_URL}/`);
		await page.goto(`${BASE_URL}/inventory/loudspeakers/${modelId}`);
		await page.getByTestId('spec-history').waitFor();
		expect(await page.getByRole('link', { name: 'Edit specification' }).count()).toBe(0);
		expect(await page.getByRole('button', { name: 'Upload' }).count()).toBe(0);
		await page.close();
	});

	it('works on a phone: the tables scroll inside their box, the page never sideways', async () => {
		const page = await browser.newPage({ viewport: { width: 390, height: 844 } });
		await signIn(page, WAREHOUSE);
		await page.waitForURL(`${BASE_URL}/`);
		for (const path of ['/inventory/loudspeakers', '/inventory/units', `/inventory/loudspeakers/${modelId}/edit`, '/inventory/packages/new']) {
			await page.goto(`${BASE_URL}${path}`);
			await page.locator('main').waitFor();
			const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
			expect({ path, overflow }).toEqual({ path, overflow: 0 });
		}
		await page.goto(`${BASE_URL}/inventory/loudspeakers`);
		await screenshot(page, 'inventory-loudspeakers-390');
		await page.close();
	});
});

/**
 * The site plan preview: receivers move by mouse drag and by keyboard, the table's numbers follow,
 * the level map's contour lines are redrawn in the browser when the aim or the position moves, and
 * axe finds nothing at the desk width or on a phone.
 */
import type { Browser, Locator, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runAxe } from './a11y/axe';
import { horizontalOverflow, PHONE, WIDE } from './a11y/pages';
import { BASE_URL, launchBrowser, screenshot, signIn } from './browser';
import { SALES } from '../helpers/demo-accounts';

const PATH = '/sites/plan-preview';

let browser: Browser;

beforeAll(async () => {
	browser = await launchBrowser();
});
afterAll(async () => {
	await browser?.close();
});

async function openPreview(
	viewport: { width: number; height: number },
	touch = false
): Promise<Page> {
	const context = await browser.newContext({
		viewport,
		locale: 'en-GB',
		hasTouch: touch,
		isMobile: touch
	});
	const page = await context.newPage();
	await signIn(page, SALES);
	await page.waitForURL(`${BASE_URL}/`);
	await page.goto(`${BASE_URL}${PATH}`);
	await page
		.locator('[data-testid="level-map"] path[data-level]')
		.first()
		.waitFor({ state: 'attached' });
	return page;
}

async function contourPaths(page: Page): Promise<string> {
	return (
		await page
			.locator('[data-testid="level-map"] path')
			.evaluateAll((ps) => ps.map((p) => p.getAttribute('d')))
	).join('|');
}

async function rowNumbers(row: Locator): Promise<Record<string, string>> {
	const out: Record<string, string> = {};
	for (const field of ['x', 'y', 'distance', 'bearing'])
		out[field] = await row.locator(`input[data-field="${field}"]`).inputValue();
	return out;
}

async function waitForChange(read: () => Promise<string>, before: string): Promise<string> {
	for (let i = 0; i < 40; i++) {
		const now = await read();
		if (now !== before) return now;
		await new Promise((r) => setTimeout(r, 50));
	}
	return read();
}

async function dragBy(page: Page, target: Locator, dx: number, dy: number): Promise<void> {
	const box = (await target.boundingBox())!;
	const x = box.x + box.width / 2;
	const y = box.y + box.height / 2;
	await page.mouse.move(x, y);
	await page.mouse.down();
	await page.mouse.move(x + dx, y + dy, { steps: 8 });
	await page.mouse.up();
}

async function axeClean(page: Page, label: string): Promise<void> {
	const findings = await runAxe(page);
	expect(
		findings.map(
			(f) => `${label}: ${f.id} (${f.impact}) ${f.nodes.map((n) => n.target).join(', ')}`
		)
	).toEqual([]);
}

describe.each([
	['desk', WIDE],
	['phone', PHONE]
] as const)('site plan preview at the %s width', (name, viewport) => {
	it('moves receivers by mouse and keyboard, redraws the map, and passes axe', async () => {
		const page = await openPreview(viewport);
		const rows = page.locator('[data-testid="receiver-row"]');
		const markers = page.locator('[data-testid="plan-receiver"]');
		expect(await rows.count()).toBe(3);

		// The plan fits the width (a phone never scrolls sideways); the table scrolls and says so there.
		const svgBox = (await page.locator('svg[aria-label^="Preview site plan"]').boundingBox())!;
		expect(svgBox.width).toBeLessThanOrEqual(viewport.width);
		expect(await horizontalOverflow(page)).toBeLessThanOrEqual(0);
		const hint = page.locator('[data-testid="table-scroll-hint"]');
		expect(await hint.isVisible()).toBe(viewport.width < 600);

		// Drag the first receiver with the mouse: its numbers change in the table.
		const before = await rowNumbers(rows.nth(0));
		await dragBy(page, markers.nth(0).locator('path'), 60, 40);
		const afterDrag = await rowNumbers(rows.nth(0));
		expect(afterDrag.x).not.toBe(before.x);
		expect(afterDrag.y).not.toBe(before.y);
		expect(Number(afterDrag.x)).toBeGreaterThan(Number(before.x));
		expect(Number(afterDrag.y)).toBeLessThan(Number(before.y));

		// Move the second with the keyboard: 1 m east, then 10 m north.
		const second = await rowNumbers(rows.nth(1));
		await markers.nth(1).focus();
		await page.keyboard.press('ArrowRight');
		await page.keyboard.press('Shift+ArrowUp');
		const moved = await rowNumbers(rows.nth(1));
		expect(Number(moved.x)).toBeCloseTo(Number(second.x) + 1, 6);
		expect(Number(moved.y)).toBeCloseTo(Number(second.y) + 10, 6);
		expect(moved.distance).not.toBe(second.distance);

		// Turn the aim with the keyboard and drag the position: the contour lines are redrawn each time.
		const paths0 = await contourPaths(page);
		const position = page.locator('[data-testid="plan-position"]');
		await position.focus();
		await page.keyboard.press('Shift+ArrowRight');
		const paths1 = await waitForChange(() => contourPaths(page), paths0);
		expect(paths1).not.toBe(paths0);
		expect(await page.getByLabel('Aim (° from north)').inputValue()).toBe('30');
		await dragBy(page, position.locator('circle').nth(2), -30, -30);
		const paths2 = await waitForChange(() => contourPaths(page), paths1);
		expect(paths2).not.toBe(paths1);

		// The map's weighting toggles between dB(A) and dB(C).
		await page.locator('label', { hasText: 'dB(C)' }).click();
		await page
			.locator('[data-testid="level-map"][data-weighting="C"] path[data-level]')
			.first()
			.waitFor({ state: 'attached' });
		expect(await contourPaths(page)).not.toBe(paths2);

		const ms = await page.locator('svg[data-map-ms]').getAttribute('data-map-ms');
		console.log(
			`site plan @${viewport.width}: last level map (grid + contours) took ${ms} ms in the browser`
		);
		await screenshot(page, `site-plan-${name}`);
		await axeClean(page, `${PATH} @${viewport.width}`);
		await page.context().close();
	});
});

describe('site plan preview on a touch screen', () => {
	it('moves a receiver with a finger', async () => {
		const page = await openPreview(PHONE, true);
		const row = page.locator('[data-testid="receiver-row"]').nth(2);
		const before = await rowNumbers(row);
		const box = (await page
			.locator('[data-testid="plan-receiver"]')
			.nth(2)
			.locator('path')
			.boundingBox())!;
		const x = box.x + box.width / 2;
		const y = box.y + box.height / 2;
		// Playwright has no touch drag; Chromium's DevTools protocol sends real touch events.
		const cdp = await page.context().newCDPSession(page);
		const touch = (
			type: 'touchStart' | 'touchMove' | 'touchEnd',
			points: { x: number; y: number }[]
		) => cdp.send('Input.dispatchTouchEvent', { type, touchPoints: points });
		await touch('touchStart', [{ x, y }]);
		for (let i = 1; i <= 6; i++) await touch('touchMove', [{ x: x - 5 * i, y: y + 5 * i }]);
		await touch('touchEnd', []);
		const after = await rowNumbers(row);
		expect(Number(after.x)).toBeLessThan(Number(before.x));
		expect(Number(after.y)).toBeLessThan(Number(before.y));
		await page.context().close();
	});
});

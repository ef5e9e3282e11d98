/**
 * Out and back in a real browser on a phone-sized screen: chromium's fake camera plays a video of a
 * unit label (made here from a QR PNG), the pick list's scanner reads it and the unit goes out. Then
 * a typed wrong serial gets its message beside the field, and axe and screenshots cover the new pages.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { writeLabelVideo } from '../helpers/y4m';
import { PHONE, WIDE, horizontalOverflow } from './a11y/pages';
import { runAxe } from './a11y/axe';
import { BASE_URL, launchBrowser, screenshot, signIn } from './browser';
import { api } from './http';
import { makeOwnBooking, type OwnBooking } from './out-and-back-helpers';
import { EMAILS, signInEveryone, type Sessions } from './proof/people';

let browser: Browser;
let sessions: Sessions;
let own: OwnBooking;
const dir = mkdtempSync(path.join(tmpdir(), 'throwline-camera-'));

beforeAll(async () => {
	sessions = await signInEveryone();
	own = await makeOwnBooking(sessions);
	const video = await writeLabelVideo(own.speakers[0].serial, path.join(dir, 'label.y4m'));
	browser = await launchBrowser(['--use-fake-device-for-media-stream', '--use-fake-ui-for-media-stream', `--use-file-for-fake-video-capture=${video}`]);
}, 120_000);

afterAll(async () => {
	await browser?.close();
	rmSync(dir, { recursive: true, force: true });
});

async function phonePage(email: string): Promise<Page> {
	const context = await browser.newContext({ viewport: PHONE, deviceScaleFactor: 1, hasTouch: true, isMobile: true });
	await context.grantPermissions(['camera'], { origin: BASE_URL });
	const page = await context.newPage();
	await signIn(page, email);
	await page.waitForURL((url) => !url.pathname.startsWith('/signin'));
	return page;
}

describe('scanning with the phone camera', () => {
	it('a label held to the camera dispatches the unit at 390 px', async () => {
		const page = await phonePage(EMAILS.warehouse);
		await page.goto(`${BASE_URL}/bookings/${own.bookingId}`);
		await page.getByRole('button', { name: 'Use the camera' }).click();
		const message = page.locator('#scan-message');
		await expect.poll(() => message.textContent(), { timeout: 30_000, interval: 250 }).toContain(`${own.speakers[0].serial}`);
		expect(await message.textContent()).toMatch(/is out\./);
		await screenshot(page, 'bookings-scan-camera-390');
		await page.getByRole('button', { name: 'Stop camera' }).click();

		const pick = await api(`/api/bookings/${own.bookingId}`, { cookie: sessions.warehouse });
		expect(pick.json.booking.state).toBe('out');
		const speakers = pick.json.lines.find((l: { modelType: string }) => l.modelType === 'loudspeaker');
		expect(speakers.units).toEqual([expect.objectContaining({ serial: own.speakers[0].serial, on: 'out' })]);
		expect(await page.getByTestId('state-words').textContent()).toMatch(/Partly out: 1 of 3/);
		expect(await horizontalOverflow(page)).toBeLessThanOrEqual(0);
		await page.context().close();
	}, 90_000);

	it('a typed serial that is wrong gets its reason beside the field and changes nothing', async () => {
		const page = await phonePage(EMAILS.warehouse);
		await page.goto(`${BASE_URL}/bookings/${own.bookingId}`);
		await page.getByLabel(/^Serial/).fill('NOT-A-LABEL-9');
		await page.getByRole('button', { name: 'Scan out' }).click();
		await expect.poll(() => page.locator('#scan-message').textContent(), { timeout: 10_000 }).toMatch(/No unit has the serial NOT-A-LABEL-9/);
		const box = await page.locator('#scan-message').boundingBox();
		const field = await page.getByLabel(/^Serial/).boundingBox();
		expect(box!.y - (field!.y + field!.height)).toBeLessThan(120); // the message sits right under the field
		await screenshot(page, 'bookings-scan-refused-390');
		const pick = await api(`/api/bookings/${own.bookingId}`, { cookie: sessions.warehouse });
		expect(pick.json.booking.dispatched).toBe(1);
		await page.context().close();
	}, 60_000);
});

describe('the new pages: axe clean, no sideways scroll at 390 px', () => {
	it('has no axe violations at 1280 and 390 px; the phone pages are screenshotted', async () => {
		const page = await phonePage(EMAILS.warehouse);
		const pages: [string, string][] = [
			['bookings', '/bookings'],
			['booking', `/bookings/${own.bookingId}`],
			['availability', `/bookings/availability?model=loudspeaker:${own.speakerId}`],
			['tests', '/bookings/tests'],
			['repairs', '/bookings/repairs'],
			['labels', '/bookings/labels'],
			['label-sheet', `/bookings/labels/print?booking=${own.bookingId}`],
			['delivery-note', `/bookings/${own.bookingId}/delivery-note`],
			['overview', '/']
		];
		const problems: string[] = [];
		for (const [name, url] of pages) {
			for (const size of [WIDE, PHONE]) {
				await page.setViewportSize(size);
				await page.goto(`${BASE_URL}${url}`);
				await page.evaluate(() => document.querySelectorAll('details').forEach((d) => (d.open = true)));
				for (const v of await runAxe(page)) problems.push(`${name} @${size.width}: ${v.id} (${v.impact}) ${v.nodes.slice(0, 3).map((n) => n.target).join(', ')}`);
				if (size === PHONE) {
					const overflow = await horizontalOverflow(page);
					if (overflow > 0) problems.push(`${name} @390: scrolls sideways by ${overflow}px`);
				}
				await screenshot(page, `bookings-${name}-${size.width}`);
			}
		}
		expect(problems).toEqual([]);
		await page.context().close();
	}, 180_000);

	it('the desk reads each hire’s state in words on the client’s record, never its code', async () => {
		const quote = (await api(`/api/quotes/${own.quoteId}`, { cookie: sessions.sales })).json;
		const page = await phonePage(EMAILS.sales);
		await page.goto(`${BASE_URL}/clients/${quote.clientId}`);
		const text = (await page.locator('body').textContent()) ?? '';
		expect(text).toMatch(/· (Confirmed|Out|Back|Closed|Cancelled)\b/);
		expect(text).not.toMatch(/· (confirmed|out|back|closed|cancelled)\b/);
		await page.context().close();
	});

	it('the client reads the state of their hire in plain words on their quote', async () => {
		const page = await phonePage(EMAILS.client);
		await page.goto(`${BASE_URL}/quotes/${own.quoteId}`);
		expect(await page.getByTestId('hire-state').textContent()).toMatch(/Your hire:\s+Partly out: 1 of 3 units have left the warehouse/);
		expect(await runAxe(page)).toEqual([]);
		await screenshot(page, 'bookings-client-quote-390');
		await page.context().close();
	});
});

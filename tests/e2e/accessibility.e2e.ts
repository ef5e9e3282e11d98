import type { Browser, BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AxeReport } from './a11y/axe';
import { checkPage, focusState, openAllDetails, WIDE, type PageCheck } from './a11y/pages';
import { BASE_URL, launchBrowser, screenshot, signIn } from './browser';
import { api, sessionCookie } from './http';
import { makeFixtures, tag } from './inventory-helpers';
import { ADMIN, SALES, WAREHOUSE } from '../helpers/demo-accounts';

const CLIENT = 'events@st-aldric.test';

let browser: Browser;
const report = new AxeReport();
let fixtures: Awaited<ReturnType<typeof makeFixtures>>;
let clientId: number;
let sentQuoteId: number;
let acceptedQuoteId: number;

/** A quote made and sent through the API as the desk would, for the client's own school. */
async function sentQuote(eventName: string): Promise<number> {
	const sales = await sessionCookie(SALES);
	const request = {
		targetDb: 88, weighting: 'A', distance: 20, distanceUnit: 'm', programme: 'speech',
		startDate: '2034-05-13', endDate: '2034-05-14', boundary: { distance: 250, limitDb: 65, weighting: 'C' }
	};
	const ranked = await api('/api/evaluations', { cookie: sales, method: 'POST', body: request });
	expect(ranked.status).toBe(200);
	const pick = ranked.json.results.find((r: { verdict: string }) => r.verdict !== 'short') ?? ranked.json.results[0];
	const created = await api('/api/quotes', {
		cookie: sales,
		method: 'POST',
		body: { clientId, eventName, packageId: pick.packageId, request }
	});
	expect(created.status).toBe(201);
	const sent = await api(`/api/quotes/${created.json.id}/actions`, { cookie: sales, method: 'POST', body: { action: 'send' } });
	expect(sent.status).toBe(200);
	return created.json.id;
}

beforeAll(async () => {
	browser = await launchBrowser();
	const admin = await sessionCookie(ADMIN);
	fixtures = await makeFixtures(admin);
	const users = await api('/api/users', { cookie: admin });
	clientId = users.json.find((u: { email: string }) => u.email === CLIENT).clientId;
	sentQuoteId = await sentQuote(`Accessibility check ${tag()}`);
	acceptedQuoteId = await sentQuote(`Accessibility check, accepted ${tag()}`);
	const accepted = await api(`/api/quotes/${acceptedQuoteId}/actions`, {
		cookie: await sessionCookie(CLIENT),
		method: 'POST',
		body: { action: 'accept', acceptTerms: true }
	});
	expect(accepted.status).toBe(200);
}, 120_000);

afterAll(async () => {
	if (report.rows.length) console.log(report.toString());
	await browser?.close();
});

async function signedIn(email: string): Promise<{ context: BrowserContext; page: Page }> {
	const context = await browser.newContext({ viewport: WIDE, locale: 'en-GB', bypassCSP: true });
	const page = await context.newPage();
	await signIn(page, email);
	await page.waitForURL(`${BASE_URL}/`);
	return { context, page };
}

const resultsShown = async (page: Page) => {
	await page.getByText(/\d+ packages checked/).waitFor();
	await openAllDetails(page);
};

async function checkAll(page: Page, checks: PageCheck[]): Promise<void> {
	const problems: string[] = [];
	for (const check of checks) problems.push(...(await checkPage(page, report, check)));
	expect(problems).toEqual([]);
}

describe('every main page passes axe (no serious or critical findings), fits a phone, and is screenshotted', () => {
	it('the sign-in page', async () => {
		const context = await browser.newContext({ viewport: WIDE, bypassCSP: true });
		const page = await context.newPage();
		await checkAll(page, [
			{ name: 'signin', path: '/signin' },
			{ name: 'signin-help', path: '/signin/help' },
			{ name: 'signin-reset-expired', path: '/signin/reset/not-a-real-reset-token-at-all' },
			{
				name: 'signin-error',
				path: '/signin',
				ready: async (p) => {
					await p.getByLabel('E-mail').fill('nobody@example.test');
					await p.getByLabel('Password').fill('not the password');
					await p.getByRole('button', { name: 'Sign in' }).click();
					await p.getByRole('alert').waitFor();
				}
			}
		]);
		await context.close();
	}, 120_000);

	it('the warehouse: overview, inventory tables, forms and detail pages, what goes out', async () => {
		const { context, page } = await signedIn(WAREHOUSE);
		const { speakerId, ampId, packageId, unitId } = fixtures;
		await checkAll(page, [
			{ name: 'overview-warehouse', path: '/' },
			{ name: 'loudspeakers', path: '/inventory/loudspeakers' },
			{ name: 'amplifiers', path: '/inventory/amplifiers' },
			{ name: 'packages', path: '/inventory/packages' },
			{ name: 'units', path: '/inventory/units' },
			{ name: 'loudspeaker-new', path: '/inventory/loudspeakers/new' },
			{
				name: 'loudspeaker-edit-error',
				path: `/inventory/loudspeakers/${speakerId}/edit`,
				ready: async (p) => {
					await p.getByLabel('Sensitivity (on axis, 1 m)').fill('150');
					await p.getByRole('button', { name: 'Save changes' }).click();
					await p.getByText('At most 120 dB').waitFor();
				}
			},
			{
				name: 'loudspeaker-edit-directivity-grid',
				path: `/inventory/loudspeakers/${speakerId}/edit`,
				ready: async (p) => {
					await p.getByRole('button', { name: 'Enter a table' }).click();
					await p.getByLabel('1 kHz at 90°, dB').waitFor();
				}
			},
			{ name: 'loudspeaker-detail', path: `/inventory/loudspeakers/${speakerId}` },
			{ name: 'amplifier-detail', path: `/inventory/amplifiers/${ampId}` },
			{ name: 'package-new', path: '/inventory/packages/new' },
			{ name: 'package-detail', path: `/inventory/packages/${packageId}` },
			{ name: 'unit-detail', path: `/inventory/units/${unitId}` },
			{ name: 'unit-new', path: '/inventory/units/new' },
			{ name: 'import', path: '/inventory/import' },
			{ name: 'bookings-warehouse', path: '/bookings' }
		]);
		await context.close();
	}, 240_000);

	it('the sales desk: the request page with results, a saved quote, its revision and print view', async () => {
		const { context, page } = await signedIn(SALES);
		await checkAll(page, [
			{ name: 'overview-sales', path: '/' },
			{ name: 'quotes-sales', path: '/quotes' },
			{ name: 'quote-new', path: '/quotes/new', ready: resultsShown },
			{ name: 'quote-sales', path: `/quotes/${sentQuoteId}`, ready: openAllDetails },
			{ name: 'quote-edit', path: `/quotes/${sentQuoteId}/edit`, ready: resultsShown },
			{ name: 'quote-print', path: `/quotes/${sentQuoteId}/print` },
			{ name: 'quote-accepted-sales', path: `/quotes/${acceptedQuoteId}` },
			{ name: 'clients', path: '/clients' },
			{ name: 'client-detail', path: `/clients/${clientId}` },
			{ name: 'account-sales', path: '/account' }
		]);
		await context.close();
	}, 240_000);

	it('the client: the sent quote, and the accepted one with its deposit invoice', async () => {
		const { context, page } = await signedIn(CLIENT);
		await checkAll(page, [
			{ name: 'overview-client', path: '/' },
			{ name: 'quotes-client', path: '/quotes' },
			{
				name: 'quote-client',
				path: `/quotes/${sentQuoteId}`,
				ready: async (p) => {
					await p.getByRole('button', { name: 'Accept this quote' }).waitFor();
					await openAllDetails(p);
				}
			},
			{
				name: 'quote-client-invoice',
				path: `/quotes/${acceptedQuoteId}`,
				ready: async (p) => {
					await p.getByRole('heading', { name: 'Invoices' }).waitFor();
					await p.getByTestId('invoice-status-deposit').waitFor();
				}
			}
		]);
		await context.close();
	}, 240_000);

	it('the admin: users, programmes, settings, what goes out', async () => {
		const { context, page } = await signedIn(ADMIN);
		const checks: PageCheck[] = [
			{ name: 'overview-admin', path: '/' },
			{ name: 'admin-users', path: '/admin/users' },
			{ name: 'admin-programmes', path: '/admin/programmes' },
			{ name: 'admin-settings', path: '/admin/settings' },
			{ name: 'admin-settings-logo', path: '/admin/settings/logo' },
			{ name: 'bookings', path: '/bookings' }
		];
		await page.goto(`${BASE_URL}/admin/programmes`);
		const programme = await page.locator('main a[href^="/admin/programmes/"]').first().getAttribute('href');
		if (programme) checks.splice(3, 0, { name: 'admin-programme', path: programme });
		await page.goto(`${BASE_URL}/bookings`);
		const booking = await page.locator('main a[href^="/bookings/"]').first().getAttribute('href', { timeout: 1000 }).catch(() => null);
		if (booking) checks.push({ name: 'booking-detail', path: booking });
		await checkAll(page, checks);
		await context.close();
	}, 240_000);
});

/** Presses Tab (or Shift+Tab) until the focused element matches; fails after `max` presses. */
async function tabUntil(
	page: Page,
	matches: (f: Awaited<ReturnType<typeof focusState>> & { type: string; inputName: string; value: string }) => boolean,
	{ back = false, max = 60 } = {}
) {
	for (let i = 0; i < max; i++) {
		await page.keyboard.press(back ? 'Shift+Tab' : 'Tab');
		const state = await focusState(page);
		const extra = await page.evaluate(() => {
			const el = document.activeElement as HTMLInputElement | null;
			return { type: el?.type ?? '', inputName: el?.name ?? '', value: el?.value ?? '' };
		});
		const focused = { ...state, ...extra };
		if (matches(focused)) return focused;
	}
	throw new Error(`focus never reached the element after ${max} presses`);
}

async function replaceValue(page: Page, text: string): Promise<void> {
	await page.keyboard.press('ControlOrMeta+A');
	await page.keyboard.type(text);
}

describe('the desk flow by keyboard alone', () => {
	it('choose the client, name the event, change level, weighting and distance, pick a package, save', async () => {
		const { context, page } = await signedIn(SALES);
		await page.goto(`${BASE_URL}/quotes/new`);
		await page.getByText(/\d+ packages checked/).waitFor();
		const clientName: string = (
			await api('/api/users', { cookie: await sessionCookie(ADMIN) })
		).json.find((u: { email: string }) => u.email === CLIENT).clientName ?? '';

		// The first Tab offers a way past the navigation, and shows where focus is.
		await page.keyboard.press('Tab');
		const skip = await focusState(page);
		expect(skip).toMatchObject({ tag: 'a', visible: true });
		expect(skip.name).toMatch(/skip/i);
		await page.keyboard.press('Enter');

		// The skip link puts focus on the page itself: the next Tab is its first field.
		const client = await tabUntil(page, (f) => f.id === 'clientId', { max: 1 });
		expect(client.visible).toBe(true);
		// A closed select takes type-ahead: the first letters pick the option.
		await page.keyboard.type(clientName.slice(0, 12));
		await expect(page.locator('#clientId option:checked').textContent()).resolves.toBe(clientName);

		const event = `Keyboard-only quote ${tag()}`;
		await tabUntil(page, (f) => f.id === 'eventName', { max: 3 });
		await page.keyboard.type(event);

		const level = await tabUntil(page, (f) => f.id === 'targetDb', { max: 10 });
		expect(level.visible).toBe(true);
		await replaceValue(page, '96');

		// The weighting is a radio group: Tab lands on the chosen one, the arrows change it.
		const weighting = await tabUntil(page, (f) => f.inputName === 'weighting', { max: 2 });
		expect(weighting.visible).toBe(true);
		await page.keyboard.press('ArrowRight');
		await expect(page.locator('input[name="weighting"]:checked').inputValue()).resolves.toBe('C');

		await tabUntil(page, (f) => f.id === 'distance', { max: 2 });
		await replaceValue(page, '40');
		await page.getByText('Checking…').waitFor({ timeout: 5000 }).catch(() => undefined);
		await page.getByText(/\d+ packages checked/).waitFor();

		// Past the rest of the request and the save button into the ranked packages.
		const save = await tabUntil(page, (f) => f.tag === 'button' && /^Save quote with/.test(f.name), { max: 40 });
		expect(save.visible).toBe(true);
		const firstPick = await tabUntil(page, (f) => f.inputName === 'packageId' && f.type === 'radio', { max: 3 });
		expect(firstPick.visible).toBe(true);
		// Tab lands on the package the desk has picked (the suggestion); the arrows move the pick.
		const radios = page.locator('input[type="radio"][name="packageId"]');
		expect(await radios.count()).toBeGreaterThan(1);
		expect(firstPick.value).toBe(await page.locator('input[type="radio"][name="packageId"]:checked').inputValue());
		await page.keyboard.press('ArrowDown');
		const chosenId = Number(await page.locator('input[type="radio"][name="packageId"]:checked').inputValue());
		const chosen = await page.evaluate(() => (document.activeElement as HTMLInputElement).value);
		expect(Number(chosen)).toBe(chosenId);
		expect(chosenId).not.toBe(Number(firstPick.value));
		const chosenName = await page.locator('input[type="radio"][name="packageId"]:checked').evaluate(
			(radio) => radio.closest('label')?.querySelector('.font-semibold')?.textContent ?? ''
		);
		expect(chosenName).not.toBe('');
		await screenshot(page, 'a11y-keyboard-package-1280');

		const back = await tabUntil(page, (f) => f.tag === 'button', { back: true, max: 3 });
		expect(back.name).toBe(`Save quote with ${chosenName}`);
		expect(back.visible).toBe(true);
		await page.keyboard.press('Enter');
		await page.waitForURL(/\/quotes\/\d+$/);
		const id = Number(new URL(page.url()).pathname.split('/').pop());
		const saved = await api(`/api/quotes/${id}`, { cookie: await sessionCookie(SALES) });
		expect(saved.status).toBe(200);
		expect(saved.json).toMatchObject({ eventName: event, packageName: chosenName, clientId });
		expect(saved.json.request).toMatchObject({ targetDb: 96, weighting: 'C', distance: 40 });
		await context.close();
	}, 120_000);
});

/** Numbers as the charts print them: "−3.1 dB", "+4.0 dB", "96.2". */
const num = (text: string | null) => Number((text ?? '').replace('−', '-').replace(/[^\d.+-]/g, ''));
/** The API's value as the page rounds it, to one decimal. */
const shownAs = (value: number) => Number(value.toFixed(1));

describe('the charts have a text alternative', () => {
	it('level versus distance and band headroom: role=img with a label, and the same numbers as the API in a table', async () => {
		const { context, page } = await signedIn(SALES);
		let lastBody: unknown = null;
		page.on('request', (r) => {
			if (r.url().endsWith('/api/evaluations') && r.method() === 'POST') lastBody = r.postDataJSON();
		});
		await page.goto(`${BASE_URL}/quotes/new`);
		await page.getByText(/\d+ packages checked/).waitFor();
		await page.getByLabel(/Level at the position/).fill('97');
		await page.getByLabel(/Distance from the system to the position/).fill('35');
		await page.getByLabel(/There is a limit at a boundary/).check();
		await page.locator('#boundaryDistance').fill('400');
		await page.locator('#boundaryLimitDb').fill('68');
		await page.waitForFunction(() => /\d+ packages checked/.test(document.body.innerText) && !document.body.innerText.includes('Checking…'));
		await page.waitForTimeout(500);
		await page.getByText(/\d+ packages checked/).waitFor();
		expect(lastBody).toMatchObject({ targetDb: 97, distance: 35, boundary: { distance: 400, limitDb: 68 } });

		const response = await api('/api/evaluations', { cookie: await sessionCookie(SALES), method: 'POST', body: lastBody });
		expect(response.status).toBe(200);
		const heading = await page.getByRole('heading', { name: / in detail$/ }).textContent();
		const name = heading!.replace(/ in detail$/, '');
		const result = response.json.results.find((r: { packageName: string }) => r.packageName === name);
		expect(result?.evaluation).toBeTruthy();

		const levelChart = page.getByRole('img', { name: /Level versus distance/ });
		const levelLabel = (await levelChart.getAttribute('aria-label'))!;
		expect(levelLabel).toContain('97.0 dB(A) at front of house');
		expect(levelLabel).toMatch(/Boundary at 400 m: limit 68\.0 dB\(A\), predicted /);
		const predicted = result.evaluation.boundary.predictedDb as number;
		expect(levelLabel).toContain(`predicted ${predicted.toFixed(1).replace('-', '−')} dB(A)`);

		const bandChart = page.getByRole('img', { name: /Headroom per octave band/ });
		const bandLabel = (await bandChart.getAttribute('aria-label'))!;
		const bands = result.evaluation.bands as { hz: number; requiredDb: number | null; headroomDb: number | null }[];
		const short = bands.filter((b) => b.headroomDb !== null && b.headroomDb < 0).length;
		expect(bandLabel).toContain(`${short} short`);

		// "Show the numbers" opens a table with the values the API gave for the same request.
		for (const summary of await page.getByText('Show the numbers').all()) {
			await summary.focus();
			await page.keyboard.press('Enter');
		}
		const levelTable = page.getByRole('table', { name: /Level at each distance/ });
		await levelTable.waitFor();
		const curve = result.curve as { distanceM: number; levels: Record<string, number | null> }[];
		const levelRows = await levelTable.locator('tbody tr').all();
		expect(levelRows.length).toBeGreaterThan(2);
		for (const row of [levelRows[0], levelRows[Math.floor(levelRows.length / 2)], levelRows[levelRows.length - 1]]) {
			const distance = num(await row.locator('th').textContent());
			const point = curve.find((p) => (p.distanceM < 10 ? Number(p.distanceM.toFixed(1)) : Math.round(p.distanceM)) === distance);
			expect(point, `a curve point at ${distance} m`).toBeTruthy();
			const shown = num(await row.locator('td').first().textContent());
			expect(shown).toBeCloseTo(shownAs(point!.levels.A!), 5);
		}

		const bandTable = page.getByRole('table', { name: /per octave band/ });
		const bandRows = await bandTable.locator('tbody tr').all();
		expect(bandRows.length).toBe(bands.length);
		for (const i of [0, Math.floor(bands.length / 2), bands.length - 1]) {
			const cells = bandRows[i].locator('td');
			if (bands[i].requiredDb !== null) expect(num(await cells.nth(0).textContent())).toBeCloseTo(shownAs(bands[i].requiredDb!), 5);
			const headroom = await cells.nth(4).textContent();
			if (bands[i].headroomDb === null) expect(headroom).toMatch(/not covered/);
			else expect(num(headroom)).toBeCloseTo(shownAs(bands[i].headroomDb!), 5);
		}
		await screenshot(page, 'a11y-chart-numbers-1280');
		await context.close();
	}, 120_000);
});

describe('field hints and errors are tied to their fields', () => {
	it('the request form points each input at its hint, and at its error once there is one', async () => {
		const { context, page } = await signedIn(SALES);
		await page.goto(`${BASE_URL}/quotes/new`);
		await page.getByText(/\d+ packages checked/).waitFor();
		const width = page.locator('#audienceWidth');
		await expect(width.getAttribute('aria-describedby')).resolves.toBe('audienceWidth-hint');
		await expect(page.locator('#audienceWidth-hint').textContent()).resolves.toMatch(/coverage/);

		const level = page.getByLabel(/Level at the position/);
		await level.fill('400');
		const error = page.locator('#targetDb-error');
		await error.waitFor();
		await expect(level.getAttribute('aria-invalid')).resolves.toBe('true');
		await expect(level.getAttribute('aria-describedby')).resolves.toBe('targetDb-error');
		expect(await error.textContent()).toMatch(/at most/i);

		await level.fill('98');
		await error.waitFor({ state: 'detached' });
		await expect(level.getAttribute('aria-invalid')).resolves.toBeNull();
		await expect(level.getAttribute('aria-describedby')).resolves.toBeNull();
		await context.close();
	}, 60_000);
});

import type { Page } from 'playwright-core';
import { BASE_URL, screenshot } from '../browser';
import { AxeReport, blocking, runAxe } from './axe';

export const WIDE = { width: 1280, height: 900 };
export const PHONE = { width: 390, height: 844 };

export interface PageCheck {
	/** Short name for the summary and the screenshot files. */
	name: string;
	path: string;
	/** Waits for what makes the page "ready" (results, a chart), or puts it in the state to check. */
	ready?: (page: Page) => Promise<void>;
}

/** The page as it is now is wider than the phone's screen: the whole page scrolls sideways. */
export async function horizontalOverflow(page: Page): Promise<number> {
	return page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
}

/** Every "Show the numbers" table opened, so axe also reads what is inside the details. */
export async function openAllDetails(page: Page): Promise<void> {
	await page.evaluate(() => document.querySelectorAll('details').forEach((d) => (d.open = true)));
}

/**
 * One page at the desk width and on a phone: axe at both, a screenshot at both, and the phone
 * must not scroll sideways. Returns the problems (blocking axe findings, overflow) to assert on.
 */
export async function checkPage(page: Page, report: AxeReport, check: PageCheck): Promise<string[]> {
	const problems: string[] = [];
	await page.setViewportSize(WIDE);
	await page.goto(`${BASE_URL}${check.path}`);
	await page.waitForLoadState('networkidle');
	await check.ready?.(page);
	const wide = await runAxe(page);
	report.add(check.name, wide);
	problems.push(...blocking(wide).map((p) => `${check.name} @1280: ${p}`));
	await screenshot(page, `a11y-${check.name}-1280`);

	await page.setViewportSize(PHONE);
	// Charts size themselves from their box; let them settle at the new width.
	await page.waitForTimeout(150);
	const narrow = await runAxe(page);
	report.add(`${check.name} @390`, narrow);
	problems.push(...blocking(narrow).map((p) => `${check.name} @390: ${p}`));
	const overflow = await horizontalOverflow(page);
	if (overflow > 0) problems.push(`${check.name} @390: the page scrolls sideways by ${overflow}px`);
	await screenshot(page, `a11y-${check.name}-390`);
	return problems;
}

/** Describes the element that has focus and whether a focus indicator is drawn for it. */
export async function focusState(page: Page): Promise<{ tag: string; id: string; name: string; visible: boolean }> {
	return page.evaluate(() => {
		const el = document.activeElement as HTMLElement | null;
		if (!el || el === document.body) return { tag: 'body', id: '', name: '', visible: false };
		const drawn = (node: Element | null): boolean => {
			if (!node) return false;
			const style = getComputedStyle(node);
			const outline = style.outlineStyle !== 'none' && parseFloat(style.outlineWidth) > 0;
			const ring = style.boxShadow !== 'none' && style.boxShadow !== '';
			return outline || ring;
		};
		// A visually hidden control (a radio drawn as a segment of a button bar) shows its focus on its label.
		const hidden = el.getBoundingClientRect().width <= 1;
		return {
			tag: el.tagName.toLowerCase(),
			id: el.id,
			name: (el.getAttribute('aria-label') ?? el.textContent ?? '').trim().slice(0, 80),
			visible: hidden ? drawn(el.closest('label')) : drawn(el)
		};
	});
}

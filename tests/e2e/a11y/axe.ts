import { readFileSync } from 'node:fs';
import path from 'node:path';
import type { AxeResults, ImpactValue } from 'axe-core';
import type { Page } from 'playwright-core';

const AXE_PATH = path.resolve('node_modules/axe-core/axe.min.js');
export const IMPACTS = ['critical', 'serious', 'moderate', 'minor'] as const;
export type Impact = (typeof IMPACTS)[number];

export interface Finding {
	id: string;
	impact: ImpactValue | undefined;
	help: string;
	nodes: { target: string; html: string; summary: string }[];
}

/** Runs axe-core over the whole document as it is now and returns its violations, trimmed for logs. */
export async function runAxe(page: Page): Promise<Finding[]> {
	const loaded = await page.evaluate(() => 'axe' in window);
	// Evaluated through the DevTools protocol, which the page's Content-Security-Policy does not govern
	// (a script tag would be refused as inline script, rightly).
	if (!loaded) await page.evaluate(readFileSync(AXE_PATH, 'utf8'));
	const results = await page.evaluate(async () => {
		const axe = (window as unknown as { axe: { run: (ctx: Document, options: object) => Promise<AxeResults> } }).axe;
		return axe.run(document, { resultTypes: ['violations'] });
	});
	return results.violations.map((v) => ({
		id: v.id,
		impact: v.impact,
		help: v.help,
		nodes: v.nodes.map((n) => ({
			target: n.target.join(' '),
			html: n.html.slice(0, 160),
			summary: (n.failureSummary ?? '').replace(/\s+/g, ' ').slice(0, 240)
		}))
	}));
}

/** Violations counted by impact, and the lead's table of them page by page. */
export class AxeReport {
	readonly rows: { page: string; counts: Record<Impact, number>; ids: string[] }[] = [];

	add(page: string, findings: Finding[]): void {
		const counts = { critical: 0, serious: 0, moderate: 0, minor: 0 } as Record<Impact, number>;
		for (const f of findings) counts[(f.impact ?? 'minor') as Impact] += f.nodes.length;
		this.rows.push({ page, counts, ids: findings.map((f) => `${f.id}(${f.impact})`) });
	}

	toString(): string {
		const width = Math.max(4, ...this.rows.map((r) => r.page.length));
		const head = `${'page'.padEnd(width)}  critical serious moderate minor  rules`;
		const lines = this.rows.map(
			(r) =>
				`${r.page.padEnd(width)}  ${IMPACTS.map((i, n) => String(r.counts[i]).padStart(n === 0 ? 8 : i === 'minor' ? 5 : i.length)).join(' ')}  ${r.ids.join(', ') || '—'}`
		);
		return ['axe-core violations (nodes) by impact', head, ...lines].join('\n');
	}
}

/** The findings that must not ship: serious or critical, described well enough to fix from the log. */
export function blocking(findings: Finding[]): string[] {
	return findings
		.filter((f) => f.impact === 'serious' || f.impact === 'critical')
		.flatMap((f) => f.nodes.map((n) => `${f.id} (${f.impact}): ${f.help} — ${n.target} ${n.html} ${n.summary}`));
}

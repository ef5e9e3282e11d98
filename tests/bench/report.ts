/** The one table the bench prints, and the same rows as JSON for comparing runs. */
import { mkdirSync, writeFileSync } from 'node:fs';
import { dirname } from 'node:path';

export interface Row {
	metric: string;
	value: number;
	unit: string;
	baseline?: number;
	/** value / baseline, both measured in the same run. */
	ratio?: number;
	target?: string;
	/** undefined when there is no target. */
	ok?: boolean;
}

const HEADERS = ['metric', 'value', 'baseline', 'ratio', 'target', 'ok?'] as const;

function num(n: number, unit: string): string {
	if (!Number.isFinite(n)) return 'n/a';
	const digits = Math.abs(n) >= 1000 ? 0 : Math.abs(n) >= 100 ? 1 : 2;
	const text = n.toLocaleString('en-GB', {
		minimumFractionDigits: digits,
		maximumFractionDigits: digits
	});
	return unit ? `${text} ${unit}` : text;
}

function cells(row: Row): string[] {
	return [
		row.metric,
		num(row.value, row.unit),
		row.baseline === undefined ? '—' : num(row.baseline, row.unit),
		// Three significant figures: ratios such as 0.0364 matter between runs.
		row.ratio === undefined ? '—' : Number.isFinite(row.ratio) ? row.ratio.toPrecision(3) : 'n/a',
		row.target ?? '—',
		row.ok === undefined ? '—' : row.ok ? 'yes' : 'NO'
	];
}

export function formatTable(rows: Row[]): string {
	const table = [HEADERS.map(String), ...rows.map(cells)];
	const widths = HEADERS.map((_, col) => Math.max(...table.map((line) => line[col].length)));
	// Numbers are right-aligned so their magnitudes line up; text columns are left-aligned.
	const rightAligned = new Set([1, 2, 3]);
	const render = (line: string[]) =>
		line
			.map((cell, col) =>
				rightAligned.has(col) ? cell.padStart(widths[col]) : cell.padEnd(widths[col])
			)
			.join(' | ')
			.trimEnd();
	const rule = widths.map((w) => '-'.repeat(w)).join('-+-');
	return [render(table[0]), rule, ...table.slice(1).map(render)].join('\n');
}

export function writeJson(path: string, data: unknown): void {
	mkdirSync(dirname(path), { recursive: true });
	writeFileSync(path, JSON.stringify(data, null, 2) + '\n');
}

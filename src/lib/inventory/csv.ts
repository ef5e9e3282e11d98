import Papa from 'papaparse';
import type { z } from 'zod';
import { NOMINAL_BANDS } from '../schemas/programmes'; // relative: the e2e tests import this file outside Vite
import { fieldLabel } from './labels';

/**
 * CSV for loudspeaker and amplifier models: one header row a spreadsheet user reads ("Day rate (GBP)",
 * "Weight (kg)"), one model per row. Money is written in the currency's major unit (45.00, not 4500).
 * Import also accepts the field names older exports used as headers (`dayRateMinor`, in minor units).
 * Export and import are exact inverses: numbers are written as JavaScript prints them, "not given"
 * as an empty cell, and a text cell a spreadsheet would run as a formula is written with a leading
 * apostrophe (and read back without it). A column `field.key` is one entry of an object field
 * (`bandResponseDb.63` is the 63 Hz band response), so a row stays one flat line a spreadsheet can edit.
 * The directivity table travels in its own file (directivity-csv.ts): it is a table, not a cell.
 * Row numbers are the spreadsheet's own: the header is row 1, the first model row 2.
 */
export const LOUDSPEAKER_CSV_COLUMNS = [
	'name', 'maker', 'kind', 'sensitivityDb', 'sensitivityRef', 'impedanceOhm', 'powerContinuousW', 'powerPeakW',
	'maxSplContinuousDb', 'maxSplPeakDb', 'dispersionHDeg', 'dispersionVDeg', 'lowHz', 'highHz', 'heightM',
	'compressionDb', ...NOMINAL_BANDS.map((band) => `bandResponseDb.${band}` as const),
	'weightKg', 'dayRateMinor', 'replacementValueMinor', 'notes'
] as const;

export const AMPLIFIER_CSV_COLUMNS = [
	'name', 'maker', 'channels', 'powerW8', 'powerW4', 'powerW2', 'minLoadOhm', 'rackUnits', 'weightKg',
	'dayRateMinor', 'replacementValueMinor', 'mainsCurrentAmps', 'notes'
] as const;

/** Header text where the field's label alone would not tell a spreadsheet user what to write. */
const HEADER_TEXT: Record<string, string> = {
	kind: 'Kind (full-range, subwoofer, line-array-element or monitor)',
	sensitivityDb: 'Sensitivity (dB SPL at 1 m)',
	sensitivityRef: 'Sensitivity reference (1W or 2.83V)'
};
const MONEY_COLUMNS = new Set(['dayRateMinor', 'replacementValueMinor']);

/** Decimal places of the currency's major unit (2 for GBP, 0 for JPY). */
function currencyDigits(currency: string): number {
	return new Intl.NumberFormat('en-GB', { style: 'currency', currency }).resolvedOptions().maximumFractionDigits ?? 2;
}

/** The header a spreadsheet user reads for a column: "Day rate (GBP)", "Weight (kg)". */
export function csvHeader(column: string, currency: string): string {
	if (MONEY_COLUMNS.has(column)) return `${fieldLabel(column)} (${currency})`;
	return HEADER_TEXT[column] ?? fieldLabel(column);
}

/** Columns read as text; every other column is a number or empty. */
const TEXT_COLUMNS = new Set(['name', 'maker', 'kind', 'sensitivityRef', 'notes']);
/** Cells a spreadsheet could run as a formula, plus the apostrophe itself so the escape is reversible. */
const NEEDS_ESCAPE = /^[=+\-@\t\r']/;
const NUMBER = /^-?\d+(\.\d+)?([eE][-+]?\d+)?$/;

/** The value of one column in a row, reaching into an object field for a `field.key` column. */
export function cellOf(row: object, column: string): unknown {
	const dot = column.indexOf('.');
	const record = row as Record<string, unknown>;
	if (dot < 0) return record[column];
	const inner = record[column.slice(0, dot)] as Record<string, unknown> | null | undefined;
	return inner?.[column.slice(dot + 1)];
}

/** The inverse of cellOf over a whole row: `field.key` cells gather into one object (empty cells left out). */
function nestRow(flat: Record<string, unknown>): Record<string, unknown> {
	const row: Record<string, unknown> = {};
	for (const [column, value] of Object.entries(flat)) {
		const dot = column.indexOf('.');
		if (dot < 0) {
			row[column] = value;
			continue;
		}
		const field = column.slice(0, dot);
		if (value === null) {
			row[field] ??= null; // every cell empty: the field is "not given"
			continue;
		}
		const inner = (row[field] ??= {}) as Record<string, unknown> | null;
		if (inner) inner[column.slice(dot + 1)] = value;
		else row[field] = { [column.slice(dot + 1)]: value };
	}
	return row;
}

export function serialiseCsv(rows: readonly object[], columns: readonly string[], currency: string): string {
	const digits = currencyDigits(currency);
	const data = rows.map((row) => columns.map((c) => exportCell(c, cellOf(row, c), digits)));
	return Papa.unparse({ fields: columns.map((c) => csvHeader(c, currency)), data }, { newline: '\r\n' }) + '\r\n';
}

function exportCell(column: string, value: unknown, digits: number): string {
	if (value == null) return '';
	if (MONEY_COLUMNS.has(column) && typeof value === 'number') return (value / 10 ** digits).toFixed(digits);
	const text = String(value);
	return TEXT_COLUMNS.has(column) && NEEDS_ESCAPE.test(text) ? `'${text}` : text;
}

function cellValue(column: string, raw: string): unknown {
	if (TEXT_COLUMNS.has(column)) return raw.startsWith("'") ? raw.slice(1) : raw;
	const text = raw.trim();
	if (text === '') return null;
	return NUMBER.test(text) ? Number(text) : text; // a non-number stays text so the schema says "Enter a number"
}

export interface CsvRow<T> {
	/** The spreadsheet's row number: the header is row 1, so the first model is row 2. */
	row: number;
	values: Record<string, unknown>;
	data: T | null;
	errors: Record<string, string[]>;
}

export interface ParsedCsv<T> {
	fileErrors: string[];
	rows: CsvRow<T>[];
}

/** Which column each header names: today's readable header, or the field name older exports used. */
function matchHeaders(header: readonly string[], columns: readonly string[], currency: string) {
	const byText = new Map<string, string>();
	for (const c of columns) {
		byText.set(csvHeader(c, currency).trim().toLowerCase(), c);
		byText.set(c.toLowerCase(), c);
	}
	const sources = new Map<string, { header: string; major: boolean }>();
	const unknown: string[] = [];
	const twice: string[] = [];
	for (const h of header) {
		const column = byText.get(h.trim().toLowerCase());
		if (!column) unknown.push(h);
		else if (sources.has(column)) twice.push(h);
		else sources.set(column, { header: h, major: MONEY_COLUMNS.has(column) && h.trim().toLowerCase() !== column.toLowerCase() });
	}
	return { sources, unknown, twice };
}

/** A money cell in major units ("45.50") as minor units, or why it cannot be. */
function moneyCell(value: unknown, digits: number): { value: unknown; error?: string } {
	if (typeof value !== 'number') return { value };
	const minor = value * 10 ** digits;
	if (Math.abs(minor - Math.round(minor)) > 1e-6) return { value, error: `At most ${digits} decimal place${digits === 1 ? '' : 's'}` };
	return { value: Math.round(minor) };
}

/** Parses CSV text and validates each row with the shared schema; never throws on bad input. */
export function parseModelsCsv<S extends z.ZodType>(
	text: string,
	columns: readonly string[],
	schema: S,
	currency: string
): ParsedCsv<z.output<S>> {
	const parsed = Papa.parse<Record<string, string>>(text.replace(/^\uFEFF/, ''), { header: true, skipEmptyLines: 'greedy' });
	const { sources, unknown, twice } = matchHeaders(parsed.meta.fields ?? [], columns, currency);
	const fileErrors: string[] = [];
	const missing = columns.filter((c) => !sources.has(c));
	if (missing.length) fileErrors.push(`Missing column(s): ${missing.map((c) => csvHeader(c, currency)).join(', ')}`);
	if (unknown.length) fileErrors.push(`Unknown column(s): ${unknown.join(', ')}`);
	if (twice.length) fileErrors.push(`Column(s) given twice: ${twice.join(', ')}`);
	for (const e of parsed.errors.filter((e) => e.type !== 'FieldMismatch')) fileErrors.push(`Row ${(e.row ?? 0) + 2}: ${e.message}`);
	if (parsed.data.length === 0) fileErrors.push('The file has no rows');
	if (fileErrors.length) return { fileErrors, rows: [] };

	const digits = currencyDigits(currency);
	const seen = new Map<string, number>();
	const rows = parsed.data.map((record, index): CsvRow<z.output<S>> => {
		const row = index + 2;
		const errors: Record<string, string[]> = {};
		const flat = Object.fromEntries(
			columns.map((c) => {
				const source = sources.get(c)!;
				const raw = cellValue(c, record[source.header] ?? '');
				if (!source.major) return [c, raw];
				const money = moneyCell(raw, digits);
				if (money.error) (errors[c] ??= []).push(money.error);
				return [c, money.value];
			})
		);
		const values = nestRow(flat);
		const result = schema.safeParse(values);
		const moneyErrors = new Set(Object.keys(errors)); // the schema's "whole minor units" would only repeat them
		if (!result.success) {
			// Errors name the column by its field (`bandResponseDb.63`); the page shows its label.
			for (const issue of result.error.issues) {
				const field = issue.path.slice(0, 2).map(String).join('.') || '_';
				if (!moneyErrors.has(field)) (errors[field] ??= []).push(issue.message);
			}
		}
		const key = `${String(values.name).trim().toLowerCase()}\u0000${String(values.maker).trim().toLowerCase()}`;
		if (seen.has(key)) (errors.name ??= []).push(`Same name and maker as row ${seen.get(key)}`);
		else seen.set(key, row);
		const ok = result.success && Object.keys(errors).length === 0;
		return { row, values, data: ok ? result.data : null, errors };
	});
	return { fileErrors, rows };
}

/** Row errors in the API envelope's shape: { "3.sensitivityDb": [...] } (row 3 of the spreadsheet). */
export function csvErrorEnvelope(parsed: ParsedCsv<unknown>): Record<string, string[]> {
	const errors: Record<string, string[]> = {};
	if (parsed.fileErrors.length) errors.file = parsed.fileErrors;
	for (const row of parsed.rows) {
		for (const [field, messages] of Object.entries(row.errors)) errors[`${row.row}.${field}`] = messages;
	}
	return errors;
}

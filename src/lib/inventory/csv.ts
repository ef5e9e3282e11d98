import Papa from 'papaparse';
import type { z } from 'zod';
import { NOMINAL_BANDS } from '../schemas/programmes'; // relative: the e2e tests import this file outside Vite

/**
 * CSV for loudspeaker and amplifier models: one header row of field names, one model per row.
 * Export and import are exact inverses: numbers are written as JavaScript prints them, "not given"
 * as an empty cell, and a text cell a spreadsheet would run as a formula is written with a leading
 * apostrophe (and read back without it). A column `field.key` is one entry of an object field
 * (`bandResponseDb.63` is the 63 Hz band response), so a row stays one flat line a spreadsheet can edit.
 * The directivity table travels in its own file (directivity-csv.ts): it is a table, not a cell.
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

export function serialiseCsv(rows: readonly object[], columns: readonly string[]): string {
	const data = rows.map((row) => columns.map((c) => exportCell(c, cellOf(row, c))));
	return Papa.unparse({ fields: [...columns], data }, { newline: '\r\n' }) + '\r\n';
}

function exportCell(column: string, value: unknown): string {
	if (value == null) return '';
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
	/** 1-based data row (the header is not counted). */
	row: number;
	values: Record<string, unknown>;
	data: T | null;
	errors: Record<string, string[]>;
}

export interface ParsedCsv<T> {
	fileErrors: string[];
	rows: CsvRow<T>[];
}

/** Parses CSV text and validates each row with the shared schema; never throws on bad input. */
export function parseModelsCsv<S extends z.ZodType>(
	text: string,
	columns: readonly string[],
	schema: S
): ParsedCsv<z.output<S>> {
	const parsed = Papa.parse<Record<string, string>>(text.replace(/^\uFEFF/, ''), { header: true, skipEmptyLines: 'greedy' });
	const header = parsed.meta.fields ?? [];
	const fileErrors: string[] = [];
	const missing = columns.filter((c) => !header.includes(c));
	const unknown = header.filter((c) => !columns.includes(c));
	if (missing.length) fileErrors.push(`Missing column(s): ${missing.join(', ')}`);
	if (unknown.length) fileErrors.push(`Unknown column(s): ${unknown.join(', ')}`);
	for (const e of parsed.errors.filter((e) => e.type !== 'FieldMismatch')) fileErrors.push(`Row ${(e.row ?? 0) + 1}: ${e.message}`);
	if (parsed.data.length === 0) fileErrors.push('The file has no rows');
	if (fileErrors.length) return { fileErrors, rows: [] };

	const seen = new Map<string, number>();
	const rows = parsed.data.map((record, index): CsvRow<z.output<S>> => {
		const values = nestRow(Object.fromEntries(columns.map((c) => [c, cellValue(c, record[c] ?? '')])));
		const result = schema.safeParse(values);
		const errors: Record<string, string[]> = {};
		if (!result.success) {
			// Errors name the CSV column: `bandResponseDb.63`, like the header.
			for (const issue of result.error.issues) (errors[issue.path.slice(0, 2).map(String).join('.') || '_'] ??= []).push(issue.message);
		}
		const key = `${String(values.name).trim().toLowerCase()}\u0000${String(values.maker).trim().toLowerCase()}`;
		if (seen.has(key)) (errors.name ??= []).push(`Same name and maker as row ${seen.get(key)}`);
		else seen.set(key, index + 1);
		const ok = result.success && Object.keys(errors).length === 0;
		return { row: index + 1, values, data: ok ? result.data : null, errors };
	});
	return { fileErrors, rows };
}

/** Row errors in the API envelope's shape: { "3.sensitivityDb": [...] } (row 3 of the data). */
export function csvErrorEnvelope(parsed: ParsedCsv<unknown>): Record<string, string[]> {
	const errors: Record<string, string[]> = {};
	if (parsed.fileErrors.length) errors.file = parsed.fileErrors;
	for (const row of parsed.rows) {
		for (const [field, messages] of Object.entries(row.errors)) errors[`${row.row}.${field}`] = messages;
	}
	return errors;
}

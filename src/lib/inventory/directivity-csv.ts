import Papa from 'papaparse';
import { bandLabel, directivitySchema, type DirectivityTable } from '$lib/schemas/directivity';
import { NOMINAL_BANDS, type NominalBandKey } from '$lib/schemas/programmes';

/**
 * A directivity table as CSV, in a plain layout of our own: a header `band_hz,0,30,…,180` (the angles
 * in degrees) and one row per band, `125,0,1,2,…` (attenuation re on axis, dB). Rows come out in band
 * order; a band without a row is simply absent. The same zod schema as the forms and API judges an import.
 */
export const BAND_COLUMN = 'band_hz';
const NUMBER = /^-?\d+(\.\d+)?([eE][-+]?\d+)?$/;

export function serialiseDirectivityCsv(table: DirectivityTable): string {
	const rows = NOMINAL_BANDS.filter((band) => table.bandsDb[band]).map((band) => [band, ...table.bandsDb[band]!.map(String)]);
	return Papa.unparse({ fields: [BAND_COLUMN, ...table.anglesDeg.map(String)], data: rows }, { newline: '\r\n' }) + '\r\n';
}

export interface DirectivityCsvRow {
	/** 1-based data row (the header is not counted). */
	row: number;
	band: string;
	/** By column: `band_hz`, an angle such as `60`, or `values` for the row as a whole. */
	errors: Record<string, string[]>;
}

export interface ParsedDirectivityCsv {
	/** Problems with the file or its header row. */
	fileErrors: string[];
	rows: DirectivityCsvRow[];
	/** The table when every row is valid, else null (an import is all or nothing). */
	table: DirectivityTable | null;
}

function numberOrNull(cell: string): number | null {
	const text = cell.trim();
	return NUMBER.test(text) ? Number(text) : null;
}

/** Parses and validates a directivity CSV; never throws on bad input. */
export function parseDirectivityCsv(text: string): ParsedDirectivityCsv {
	const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), { skipEmptyLines: 'greedy' });
	const [header, ...records] = parsed.data;
	const fileErrors: string[] = [];
	if (!header) return { fileErrors: ['The file is empty'], rows: [], table: null };
	if (header[0]?.trim() !== BAND_COLUMN) fileErrors.push(`The first column must be "${BAND_COLUMN}"`);
	const angles = header.slice(1).map(numberOrNull);
	if (angles.some((a) => a === null)) fileErrors.push('Every other header cell must be an angle in degrees (0 … 180)');
	if (records.length === 0) fileErrors.push('The file has no band rows');
	if (fileErrors.length) return { fileErrors, rows: [], table: null };

	const anglesDeg = angles as number[];
	const bandsDb: Partial<Record<NominalBandKey, number[]>> = {};
	const seen = new Map<string, number>();
	const rows = records.map((record, index): DirectivityCsvRow => {
		const row = index + 1;
		const band = (record[0] ?? '').trim();
		const errors: Record<string, string[]> = {};
		const cells = record.slice(1);
		const values = cells.map(numberOrNull);
		if (!(NOMINAL_BANDS as readonly string[]).includes(band)) errors[BAND_COLUMN] = ['Use an octave band: 31.5, 63, 125, 250, 500, 1000, 2000, 4000 or 8000'];
		else if (seen.has(band)) errors[BAND_COLUMN] = [`${bandLabel(band)} is already on row ${seen.get(band)}`];
		else seen.set(band, row);
		values.forEach((v, i) => {
			if (v === null) errors[String(anglesDeg[i] ?? `column ${i + 2}`)] = ['Enter a number'];
		});
		// A row with errors of its own stays out, so the schema still judges the other rows.
		if (Object.keys(errors).length === 0) bandsDb[band as NominalBandKey] = values as number[];
		return { row, band, errors };
	});

	const result = directivitySchema.safeParse({ anglesDeg, bandsDb });
	if (!result.success) {
		for (const issue of result.error.issues) {
			const [first, band, index] = issue.path.map(String);
			if (first === 'anglesDeg') fileErrors.push(`Header: ${issue.message}`);
			const target = first === 'bandsDb' && band ? rows.find((r) => r.band === band) : undefined;
			if (!target) continue;
			const column = index === undefined ? 'values' : String(anglesDeg[Number(index)]);
			if (!target.errors[column]) target.errors[column] = [issue.message]; // "Enter a number" already says it
		}
		if (!fileErrors.length && rows.every((r) => Object.keys(r.errors).length === 0)) fileErrors.push(result.error.issues[0].message);
	}
	const valid = result.success && fileErrors.length === 0 && rows.every((r) => Object.keys(r.errors).length === 0);
	return { fileErrors, rows, table: valid ? result.data : null };
}

/** Errors in the API envelope's shape: { "3.60": [...] } is row 3, the 60° column. */
export function directivityCsvErrors(parsed: ParsedDirectivityCsv): Record<string, string[]> {
	const errors: Record<string, string[]> = {};
	if (parsed.fileErrors.length) errors.file = parsed.fileErrors;
	for (const row of parsed.rows) for (const [column, messages] of Object.entries(row.errors)) errors[`${row.row}.${column}`] = messages;
	return errors;
}

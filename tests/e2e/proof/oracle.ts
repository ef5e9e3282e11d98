/**
 * What the server must answer to a hostile body, worked out from the same rules and shared schemas
 * the routes use (parseJsonBody, readCsvBody, parseModelsCsv), and a check of the error envelope.
 */
import type { z } from 'zod';
import { parseModelsCsv } from '../../../src/lib/inventory/csv';
import type { HostileBody } from './hostile';
import type { RawAnswer } from './raw-http';

/** parseJsonBody's limit (src/lib/server/http.ts) and the CSV import's (inventory-csv.ts). */
export const MAX_JSON_BYTES = 256 * 1024;
export const MAX_CSV_BYTES = 1024 * 1024;

/** The answers hostile input may get: refusals, never a server error. */
export const REFUSALS = [400, 401, 403, 404, 409, 413, 415, 422] as const;

/** 400 / 413 / 422 as parseJsonBody decides, or 'valid' when the shared schema would accept it. */
export function jsonVerdict(b: HostileBody, schema: z.ZodType): number | 'valid' {
	if (!(b.contentType ?? '').toLowerCase().startsWith('application/json')) return 400;
	if (b.bytes.length > MAX_JSON_BYTES) return 413;
	let parsed: unknown;
	try {
		parsed = JSON.parse(b.text);
	} catch {
		return 400;
	}
	return schema.safeParse(parsed).success ? 'valid' : 422;
}

/** What an import answers (readCsvBody, then all-or-nothing applyImport), or 'valid' if it would import. */
export function csvVerdict(
	b: HostileBody,
	columns: readonly string[],
	schema: z.ZodType
): number | 'valid' {
	const type = (b.contentType ?? '').toLowerCase();
	if (b.bytes.length > MAX_CSV_BYTES + 16 * 1024) return 413;
	if (!type.startsWith('text/csv') && !type.startsWith('text/plain')) return 400;
	if (new TextEncoder().encode(b.text).length > MAX_CSV_BYTES) return 413;
	const parsed = parseModelsCsv(b.text, columns, schema, 'GBP'); // the demo company's currency
	return parsed.fileErrors.length || parsed.rows.some((r) => !r.data) ? 422 : 'valid';
}

const STACK_LINE = /\n\s+at \S+ \(|\bnode_modules\/|\/work\/|\.js:\d+:\d+/;

/** Null when the answer is the one error envelope `{ message, errors?: { field: [..] } }` with no stack in it. */
export function envelopeProblem(a: RawAnswer): string | null {
	if (STACK_LINE.test(a.text))
		return `a stack trace or server path in the body: ${a.text.slice(0, 200)}`;
	if (!a.contentType.includes('application/json'))
		return `not JSON (${a.contentType || 'no content type'}): ${a.text.slice(0, 120)}`;
	let body: { message?: unknown; errors?: unknown };
	try {
		body = JSON.parse(a.text);
	} catch {
		return `unreadable JSON: ${a.text.slice(0, 120)}`;
	}
	if (typeof body?.message !== 'string' || body.message === '')
		return `no message: ${a.text.slice(0, 120)}`;
	if (body.errors !== undefined) {
		const ok =
			body.errors !== null &&
			typeof body.errors === 'object' &&
			Object.values(body.errors).every(
				(m) => Array.isArray(m) && m.every((s) => typeof s === 'string')
			);
		if (!ok) return `errors is not { field: [messages] }: ${a.text.slice(0, 160)}`;
	}
	return null;
}

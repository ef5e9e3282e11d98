import type { Transaction } from 'sequelize';
import type { z } from 'zod';
import { AMPLIFIER_CSV_COLUMNS, LOUDSPEAKER_CSV_COLUMNS, cellOf, csvErrorEnvelope, parseModelsCsv, serialiseCsv } from '$lib/inventory/csv';
import { historyText } from './inventory-common';
import { amplifierSchema } from '$lib/schemas/inventory-amplifiers';
import { loudspeakerSchema } from '$lib/schemas/inventory-loudspeakers';
import { DomainError } from './errors';
import { getSettings } from './settings';
import { amplifiers } from './inventory-amplifiers';
import { withTransaction } from './inventory-common';
import { loudspeakers } from './inventory-loudspeakers';

/** What the import needs of a model service, loose enough for both kinds. */
interface CsvModelService {
	list(): Promise<object[]>;
	findByNameAndMaker(name: string, maker: string, transaction?: Transaction): Promise<({ id: number } & object) | null>;
	// eslint-disable-next-line @typescript-eslint/no-explicit-any -- rows are validated by the kind's schema first
	create(input: any, actorId: number | null, transaction?: Transaction): Promise<unknown>;
	// eslint-disable-next-line @typescript-eslint/no-explicit-any
	update(id: number, changes: any, actorId: number | null, transaction?: Transaction): Promise<{ changed: string[] }>;
}

/** The two model lists that travel as CSV, with their columns and schema. */
export const CSV_KINDS: Record<'loudspeakers' | 'amplifiers', { service: CsvModelService; columns: readonly string[]; schema: z.ZodType }> = {
	loudspeakers: { service: loudspeakers, columns: LOUDSPEAKER_CSV_COLUMNS, schema: loudspeakerSchema as z.ZodType },
	amplifiers: { service: amplifiers, columns: AMPLIFIER_CSV_COLUMNS, schema: amplifierSchema as z.ZodType }
};
export type CsvKind = keyof typeof CSV_KINDS;

export const MAX_CSV_BYTES = 1024 * 1024;

const currencyNow = async () => (await getSettings()).currency;

export async function exportModelsCsv(kind: CsvKind): Promise<string> {
	const { service, columns } = CSV_KINDS[kind];
	return serialiseCsv(await service.list(), columns, await currencyNow());
}

/** One field an update would change, old → new, as spec history stores values (minor units, JSON). */
export interface ImportChange {
	field: string;
	from: string | null;
	to: string | null;
}

export interface ImportPreviewRow {
	/** The spreadsheet's row number (the header is row 1). */
	row: number;
	name: string;
	maker: string;
	action: 'create' | 'update' | 'unchanged' | 'invalid';
	/** Fields an update would change. */
	changes: ImportChange[];
	errors: Record<string, string[]>;
}

export interface ImportPreview {
	fileErrors: string[];
	rows: ImportPreviewRow[];
	valid: boolean;
}

/** What importing the file would do, row by row, without writing anything. */
export async function previewImport(kind: CsvKind, text: string): Promise<ImportPreview> {
	const { service, columns, schema } = CSV_KINDS[kind];
	const parsed = parseModelsCsv(text, columns, schema, await currencyNow());
	const rows = await Promise.all(
		parsed.rows.map(async (r): Promise<ImportPreviewRow> => {
			const base = { row: r.row, name: String(r.values.name ?? ''), maker: String(r.values.maker ?? ''), errors: r.errors };
			if (!r.data) return { ...base, action: 'invalid', changes: [] };
			const data = r.data as Record<string, unknown>;
			const existing = (await service.findByNameAndMaker(String(data.name), String(data.maker))) as Record<string, unknown> | null;
			if (!existing) return { ...base, action: 'create', changes: [] };
			const changes = columns
				.map((field) => ({ field, from: historyText(cellOf(existing, field)), to: historyText(cellOf(data, field)) }))
				.filter((c) => c.from !== c.to);
			return { ...base, action: changes.length ? 'update' : 'unchanged', changes };
		})
	);
	return { fileErrors: parsed.fileErrors, rows, valid: parsed.fileErrors.length === 0 && rows.every((r) => r.action !== 'invalid') };
}

/**
 * Imports every row or none: rows matched by name + maker update that model (writing spec history
 * and flagging quotes), the rest are created, all in one transaction.
 */
export async function applyImport(kind: CsvKind, text: string, actorId: number | null): Promise<{ created: number; updated: number; unchanged: number }> {
	const { service, columns, schema } = CSV_KINDS[kind];
	const parsed = parseModelsCsv(text, columns, schema, await currencyNow());
	if (parsed.fileErrors.length || parsed.rows.some((r) => !r.data)) {
		throw new DomainError(422, 'The file has errors; nothing was imported.', csvErrorEnvelope(parsed));
	}
	return withTransaction(undefined, async (t) => {
		const counts = { created: 0, updated: 0, unchanged: 0 };
		for (const r of parsed.rows) {
			const data = r.data as Record<string, unknown> & { name: string; maker: string };
			try {
				const existing = await service.findByNameAndMaker(data.name, data.maker, t);
				if (!existing) {
					await service.create(data, actorId, t);
					counts.created++;
				} else {
					const { changed } = await service.update(existing.id, data, actorId, t);
					counts[changed.length ? 'updated' : 'unchanged']++;
				}
			} catch (err) {
				if (!(err instanceof DomainError)) throw err;
				const errors = Object.fromEntries(Object.entries(err.errors ?? { _: [err.message] }).map(([f, m]) => [`${r.row}.${f}`, m]));
				throw new DomainError(422, `Row ${r.row}: ${err.message} Nothing was imported.`, errors);
			}
		}
		return counts;
	});
}

import { directivityCsvErrors, parseDirectivityCsv, serialiseDirectivityCsv, type DirectivityCsvRow } from '$lib/inventory/directivity-csv';
import { DEFAULT_ANGLES_DEG, type DirectivityTable } from '$lib/schemas/directivity';
import { DomainError } from './errors';
import { loudspeakers } from './inventory-loudspeakers';

/**
 * A loudspeaker model's directivity table as CSV. A model without a table exports the header alone
 * (every 30°), a template to fill in.
 */
export async function exportDirectivityCsv(id: number): Promise<{ text: string; filename: string }> {
	const model = await loudspeakers.get(id);
	const table = (model.directivity as DirectivityTable | null | undefined) ?? { anglesDeg: DEFAULT_ANGLES_DEG, bandsDb: {} };
	const slug = `${model.maker} ${model.name}`.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '');
	return { text: serialiseDirectivityCsv(table), filename: `${slug}-directivity.csv` };
}

export interface DirectivityImportPreview {
	fileErrors: string[];
	rows: DirectivityCsvRow[];
	table: DirectivityTable | null;
	valid: boolean;
}

/** What importing the file would do, row by row, without writing anything (404 for an unknown model). */
export async function previewDirectivityImport(id: number, text: string): Promise<DirectivityImportPreview> {
	await loudspeakers.get(id);
	const parsed = parseDirectivityCsv(text);
	return { ...parsed, valid: parsed.table !== null };
}

/**
 * Replaces the model's table with the file's, or changes nothing (422 with errors per row and column).
 * Goes through the model's update, so history and the open-quote re-check follow as for a form edit.
 */
export async function applyDirectivityImport(id: number, text: string, actorId: number | null): Promise<{ changed: boolean; table: DirectivityTable }> {
	const parsed = parseDirectivityCsv(text);
	if (!parsed.table) throw new DomainError(422, 'The file has errors; nothing was imported.', directivityCsvErrors(parsed));
	const { changed } = await loudspeakers.update(id, { directivity: parsed.table }, actorId);
	return { changed: changed.length > 0, table: parsed.table };
}

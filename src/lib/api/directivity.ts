import type { DirectivityCsvRow } from '$lib/inventory/directivity-csv';
import type { DirectivityTable } from '$lib/schemas/directivity';
import type { ApiResult } from './evaluations';

export interface DirectivityImportPreview {
	fileErrors: string[];
	rows: DirectivityCsvRow[];
	table: DirectivityTable | null;
	valid: boolean;
}

async function post<T>(url: string, file: File): Promise<ApiResult<T>> {
	const response = await fetch(url, { method: 'POST', headers: { 'content-type': 'text/csv', accept: 'application/json' }, body: await file.text() });
	const payload = await response.json().catch(() => ({ message: 'The server sent an unreadable answer.' }));
	if (response.ok) return { ok: true, data: payload as T };
	return { ok: false, status: response.status, message: payload.message ?? 'Something went wrong.', errors: payload.errors ?? {} };
}

/** What importing the file would do, row by row (nothing is written). */
export function previewDirectivityCsv(modelId: number, file: File) {
	return post<DirectivityImportPreview>(`/api/loudspeakers/${modelId}/directivity.csv?preview=1`, file);
}

/** Replaces the model's directivity table with the file's, or changes nothing. */
export function importDirectivityCsv(modelId: number, file: File) {
	return post<{ changed: boolean; table: DirectivityTable }>(`/api/loudspeakers/${modelId}/directivity.csv`, file);
}

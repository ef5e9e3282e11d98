import { json } from '@sveltejs/kit';
import { requireCapability } from '$lib/server/auth/guards';
import { csvResponse, readCsvBody } from '$lib/server/http/inventory-files';
import { orHttpError } from '$lib/server/http/errors';
import { loudspeakers } from '$lib/server/services/inventory-loudspeakers';
import { applyDirectivityImport, exportDirectivityCsv, previewDirectivityImport } from '$lib/server/services/inventory-directivity';
import type { RequestHandler } from './$types';

/** The model's directivity table as CSV (`band_hz,0,30,…,180`, one row per band). */
export const GET: RequestHandler = async (event) => {
	requireCapability(event, 'inventory:read');
	const { text, filename } = await orHttpError(() => exportDirectivityCsv(Number(event.params.id)));
	return csvResponse(text, filename);
};

/** Replaces the table from a CSV, all or nothing; with `?preview=1` only reports each row's errors. */
export const POST: RequestHandler = async (event) => {
	const actor = requireCapability(event, 'inventory:edit');
	const id = Number(event.params.id);
	await orHttpError(() => loudspeakers.get(id)); // 404 before reading a file meant for no model
	const text = await readCsvBody(event.request);
	if (event.url.searchParams.has('preview')) return json(await orHttpError(() => previewDirectivityImport(id, text)));
	return json(await orHttpError(() => applyDirectivityImport(id, text, actor.id)));
};

import { json } from '@sveltejs/kit';
import { requireCapability } from '$lib/server/auth/guards';
import { readCsvBody } from '$lib/server/http/inventory-files';
import { orHttpError } from '$lib/server/http/errors';
import { applyImport, previewImport } from '$lib/server/services/inventory-csv';
import type { RequestHandler } from './$types';

/** Imports all rows or none; with `?preview=1` only reports what it would do, row by row. */
export const POST: RequestHandler = async (event) => {
	const actor = requireCapability(event, 'inventory:edit');
	const text = await readCsvBody(event.request);
	if (event.url.searchParams.has('preview')) return json(await previewImport('loudspeakers', text));
	return json(await orHttpError(() => applyImport('loudspeakers', text, actor.id)));
};

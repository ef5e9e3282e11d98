import { json } from '@sveltejs/kit';
import { INVENTORY_EDITORS, INVENTORY_READERS } from '$lib/inventory/roles';
import { requireRole } from '$lib/server/auth/guards';
import { readAttachmentUpload } from '$lib/server/inventory-http';
import { orHttpError } from '$lib/server/services/errors';
import { listAttachments, saveAttachment } from '$lib/server/services/inventory-attachments';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async (event) => {
	requireRole(event, ...INVENTORY_READERS);
	return json(await listAttachments('loudspeaker', Number(event.params.id)));
};

/** multipart/form-data with `kind` (spec-sheet | photo) and `file`; replaces the model's previous one of that kind. */
export const POST: RequestHandler = async (event) => {
	const actor = requireRole(event, ...INVENTORY_EDITORS);
	const upload = await readAttachmentUpload(event.request);
	const row = await orHttpError(() =>
		saveAttachment({ modelType: 'loudspeaker', modelId: Number(event.params.id), kind: upload.kind, originalName: upload.name, bytes: upload.bytes, userId: actor.id })
	);
	return json(row, { status: 201 });
};

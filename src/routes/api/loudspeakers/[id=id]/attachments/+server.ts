import { json } from '@sveltejs/kit';
import { requireCapability } from '$lib/server/auth/guards';
import { readAttachmentUpload } from '$lib/server/http/inventory-files';
import { orHttpError } from '$lib/server/http/errors';
import { listAttachments, saveAttachment } from '$lib/server/services/inventory-attachments';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async (event) => {
	requireCapability(event, 'inventory:read');
	return json(await listAttachments('loudspeaker', Number(event.params.id)));
};

/** multipart/form-data with `kind` (spec-sheet | photo) and `file`; replaces the model's previous one of that kind. */
export const POST: RequestHandler = async (event) => {
	const actor = requireCapability(event, 'inventory:edit');
	const upload = await readAttachmentUpload(event.request);
	const row = await orHttpError(() =>
		saveAttachment({ modelType: 'loudspeaker', modelId: Number(event.params.id), kind: upload.kind, originalName: upload.name, bytes: upload.bytes, userId: actor.id })
	);
	return json(row, { status: 201 });
};

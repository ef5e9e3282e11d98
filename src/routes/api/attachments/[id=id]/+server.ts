import { requireCapability } from '$lib/server/auth/guards';
import { attachmentResponse } from '$lib/server/http/inventory-files';
import { orHttpError } from '$lib/server/http/errors';
import { deleteAttachment, readAttachment } from '$lib/server/services/inventory-attachments';
import type { RequestHandler } from './$types';

/** Spec sheets and photos are served only here, only to signed-in staff, never from static/. */
export const GET: RequestHandler = async (event) => {
	requireCapability(event, 'inventory:read');
	const { row, bytes } = await orHttpError(() => readAttachment(Number(event.params.id)));
	return attachmentResponse(row, bytes);
};

export const DELETE: RequestHandler = async (event) => {
	requireCapability(event, 'inventory:edit');
	await orHttpError(() => deleteAttachment(Number(event.params.id)));
	return new Response(null, { status: 204 });
};

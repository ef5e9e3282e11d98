import { INVENTORY_EDITORS, INVENTORY_READERS } from '$lib/inventory/roles';
import { requireRole } from '$lib/server/auth/guards';
import { attachmentResponse } from '$lib/server/inventory-http';
import { orHttpError } from '$lib/server/services/errors';
import { deleteAttachment, readAttachment } from '$lib/server/services/inventory-attachments';
import type { RequestHandler } from './$types';

/** Spec sheets and photos are served only here, only to signed-in staff, never from static/. */
export const GET: RequestHandler = async (event) => {
	requireRole(event, ...INVENTORY_READERS);
	const { row, bytes } = await orHttpError(() => readAttachment(Number(event.params.id)));
	return attachmentResponse(row, bytes);
};

export const DELETE: RequestHandler = async (event) => {
	requireRole(event, ...INVENTORY_EDITORS);
	await orHttpError(() => deleteAttachment(Number(event.params.id)));
	return new Response(null, { status: 204 });
};

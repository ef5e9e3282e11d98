import { json } from '@sveltejs/kit';
import { INVENTORY_EDITORS, INVENTORY_READERS } from '$lib/inventory/roles';
import { loudspeakerPatchSchema } from '$lib/schemas/inventory-loudspeakers';
import { requireRole } from '$lib/server/auth/guards';
import { parseJsonBody } from '$lib/server/http';
import { orHttpError } from '$lib/server/services/errors';
import { loudspeakers } from '$lib/server/services/inventory-loudspeakers';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async (event) => {
	requireRole(event, ...INVENTORY_READERS);
	return json(await orHttpError(() => loudspeakers.get(Number(event.params.id))));
};

export const PATCH: RequestHandler = async (event) => {
	const actor = requireRole(event, ...INVENTORY_EDITORS);
	const changes = await parseJsonBody(event.request, loudspeakerPatchSchema);
	const { row } = await orHttpError(() => loudspeakers.update(Number(event.params.id), changes, actor.id));
	return json(row);
};

export const DELETE: RequestHandler = async (event) => {
	requireRole(event, ...INVENTORY_EDITORS);
	await orHttpError(() => loudspeakers.remove(Number(event.params.id)));
	return new Response(null, { status: 204 });
};

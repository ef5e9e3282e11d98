import { json } from '@sveltejs/kit';
import { INVENTORY_EDITORS, INVENTORY_READERS } from '$lib/inventory/roles';
import { loudspeakerSchema } from '$lib/schemas/inventory-loudspeakers';
import { requireRole } from '$lib/server/auth/guards';
import { parseJsonBody } from '$lib/server/http';
import { orHttpError } from '$lib/server/services/errors';
import { loudspeakers } from '$lib/server/services/inventory-loudspeakers';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async (event) => {
	requireRole(event, ...INVENTORY_READERS);
	return json(await loudspeakers.list());
};

export const POST: RequestHandler = async (event) => {
	const actor = requireRole(event, ...INVENTORY_EDITORS);
	const input = await parseJsonBody(event.request, loudspeakerSchema);
	return json(await orHttpError(() => loudspeakers.create(input, actor.id)), { status: 201 });
};

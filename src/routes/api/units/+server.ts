import { json } from '@sveltejs/kit';
import { INVENTORY_EDITORS, INVENTORY_READERS } from '$lib/inventory/roles';
import { stockUnitSchema } from '$lib/schemas/inventory-units';
import { requireRole } from '$lib/server/auth/guards';
import { parseJsonBody } from '$lib/server/http';
import { orHttpError } from '$lib/server/services/errors';
import { units } from '$lib/server/services/inventory-resources';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async (event) => {
	requireRole(event, ...INVENTORY_READERS);
	return json(await units.list());
};

/** modelType (loudspeaker | amplifier) and modelId name the model the unit is one of. */
export const POST: RequestHandler = async (event) => {
	const actor = requireRole(event, ...INVENTORY_EDITORS);
	const input = await parseJsonBody(event.request, stockUnitSchema);
	return json(await orHttpError(() => units.create(input, actor.id)), { status: 201 });
};

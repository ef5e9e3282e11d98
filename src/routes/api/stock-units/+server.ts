import { json } from '@sveltejs/kit';
import { stockUnitSchema } from '$lib/schemas/inventory-units';
import { requireCapability } from '$lib/server/auth/guards';
import { parseJsonBody } from '$lib/server/http/parse';
import { orHttpError } from '$lib/server/http/errors';
import { stockUnits } from '$lib/server/services/inventory-resources';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async (event) => {
	requireCapability(event, 'inventory:read');
	return json(await stockUnits.list());
};

/** modelType (loudspeaker | amplifier) and modelId name the model the unit is one of. */
export const POST: RequestHandler = async (event) => {
	const actor = requireCapability(event, 'inventory:edit');
	const input = await parseJsonBody(event.request, stockUnitSchema);
	return json(await orHttpError(() => stockUnits.create(input, actor.id)), { status: 201 });
};

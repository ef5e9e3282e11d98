import { json } from '@sveltejs/kit';
import { stockUnitPatchSchema } from '$lib/schemas/inventory-units';
import { requireCapability } from '$lib/server/auth/guards';
import { parseJsonBody } from '$lib/server/http/parse';
import { orHttpError } from '$lib/server/http/errors';
import { stockUnits } from '$lib/server/services/inventory-resources';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async (event) => {
	requireCapability(event, 'inventory:read');
	return json(await orHttpError(() => stockUnits.get(Number(event.params.id))));
};

export const PATCH: RequestHandler = async (event) => {
	const actor = requireCapability(event, 'inventory:edit');
	const changes = await parseJsonBody(event.request, stockUnitPatchSchema);
	return json(await orHttpError(() => stockUnits.update(Number(event.params.id), changes, actor.id)));
};

export const DELETE: RequestHandler = async (event) => {
	requireCapability(event, 'inventory:edit');
	await orHttpError(() => stockUnits.remove(Number(event.params.id)));
	return new Response(null, { status: 204 });
};

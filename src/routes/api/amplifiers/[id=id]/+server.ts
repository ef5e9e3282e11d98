import { json } from '@sveltejs/kit';
import { amplifierPatchSchema } from '$lib/schemas/inventory-amplifiers';
import { requireCapability } from '$lib/server/auth/guards';
import { parseJsonBody } from '$lib/server/http/parse';
import { orHttpError } from '$lib/server/http/errors';
import { amplifiers } from '$lib/server/services/inventory-amplifiers';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async (event) => {
	requireCapability(event, 'inventory:read');
	return json(await orHttpError(() => amplifiers.get(Number(event.params.id))));
};

export const PATCH: RequestHandler = async (event) => {
	const actor = requireCapability(event, 'inventory:edit');
	const changes = await parseJsonBody(event.request, amplifierPatchSchema);
	const { row } = await orHttpError(() => amplifiers.update(Number(event.params.id), changes, actor.id));
	return json(row);
};

export const DELETE: RequestHandler = async (event) => {
	requireCapability(event, 'inventory:edit');
	await orHttpError(() => amplifiers.remove(Number(event.params.id)));
	return new Response(null, { status: 204 });
};

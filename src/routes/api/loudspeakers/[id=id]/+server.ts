import { json } from '@sveltejs/kit';
import { loudspeakerPatchSchema } from '$lib/schemas/inventory-loudspeakers';
import { requireCapability } from '$lib/server/auth/guards';
import { parseJsonBody } from '$lib/server/http/parse';
import { orHttpError } from '$lib/server/http/errors';
import { loudspeakers } from '$lib/server/services/inventory-loudspeakers';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async (event) => {
	requireCapability(event, 'inventory:read');
	return json(await orHttpError(() => loudspeakers.get(Number(event.params.id))));
};

export const PATCH: RequestHandler = async (event) => {
	const actor = requireCapability(event, 'inventory:edit');
	const changes = await parseJsonBody(event.request, loudspeakerPatchSchema);
	const { row } = await orHttpError(() => loudspeakers.update(Number(event.params.id), changes, actor.id));
	return json(row);
};

export const DELETE: RequestHandler = async (event) => {
	requireCapability(event, 'inventory:edit');
	await orHttpError(() => loudspeakers.remove(Number(event.params.id)));
	return new Response(null, { status: 204 });
};

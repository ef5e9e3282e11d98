import { json } from '@sveltejs/kit';
import { loudspeakerSchema } from '$lib/schemas/inventory-loudspeakers';
import { requireCapability } from '$lib/server/auth/guards';
import { parseJsonBody } from '$lib/server/http/parse';
import { orHttpError } from '$lib/server/http/errors';
import { loudspeakers } from '$lib/server/services/inventory-loudspeakers';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async (event) => {
	requireCapability(event, 'inventory:read');
	return json(await loudspeakers.list());
};

export const POST: RequestHandler = async (event) => {
	const actor = requireCapability(event, 'inventory:edit');
	const input = await parseJsonBody(event.request, loudspeakerSchema);
	return json(await orHttpError(() => loudspeakers.create(input, actor.id)), { status: 201 });
};

import { json } from '@sveltejs/kit';
import { amplifierSchema } from '$lib/schemas/inventory-amplifiers';
import { requireCapability } from '$lib/server/auth/guards';
import { parseJsonBody } from '$lib/server/http/parse';
import { orHttpError } from '$lib/server/http/errors';
import { amplifiers } from '$lib/server/services/inventory-amplifiers';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async (event) => {
	requireCapability(event, 'inventory:read');
	return json(await amplifiers.list());
};

export const POST: RequestHandler = async (event) => {
	const actor = requireCapability(event, 'inventory:edit');
	const input = await parseJsonBody(event.request, amplifierSchema);
	return json(await orHttpError(() => amplifiers.create(input, actor.id)), { status: 201 });
};

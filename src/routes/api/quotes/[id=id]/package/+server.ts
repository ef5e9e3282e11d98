import { json } from '@sveltejs/kit';
import { promoteSchema } from '$lib/schemas/systems';
import { requireCapability } from '$lib/server/auth/guards';
import { parseJsonBody } from '$lib/server/http/parse';
import { orHttpError } from '$lib/server/http/errors';
import { promoteSystem } from '$lib/server/services/package-promotion';
import type { RequestHandler } from './$types';

/** Promote: the quote's composed or suggested system saved as a new package `{ name, description? }`. */
export const POST: RequestHandler = async (event) => {
	const actor = requireCapability(event, 'inventory:edit');
	const input = await parseJsonBody(event.request, promoteSchema);
	return json(await orHttpError(() => promoteSystem(Number(event.params.id), input, actor.id)), { status: 201 });
};

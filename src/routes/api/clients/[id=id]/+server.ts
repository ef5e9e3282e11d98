import { json } from '@sveltejs/kit';
import { requireCapability } from '$lib/server/auth/guards';
import { parseJsonBody } from '$lib/server/http/parse';
import { clientUpdateSchema } from '$lib/schemas/clients';
import { getClient, updateClient } from '$lib/server/services/clients';
import { orHttpError } from '$lib/server/http/errors';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async (event) => {
	requireCapability(event, 'clients:read');
	return json(await orHttpError(() => getClient(Number(event.params.id))));
};

export const PATCH: RequestHandler = async (event) => {
	const actor = requireCapability(event, 'clients:edit');
	const changes = await parseJsonBody(event.request, clientUpdateSchema);
	return json(await orHttpError(() => updateClient(Number(event.params.id), changes, actor)));
};

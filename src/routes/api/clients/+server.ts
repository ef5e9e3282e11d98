import { json } from '@sveltejs/kit';
import { requireCapability } from '$lib/server/auth/guards';
import { parseJsonBody } from '$lib/server/http/parse';
import { clientSchema } from '$lib/schemas/clients';
import { createClient, listClients } from '$lib/server/services/clients';
import { orHttpError } from '$lib/server/http/errors';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async (event) => {
	requireCapability(event, 'clients:read');
	return json(await listClients(event.url.searchParams.get('q')));
};

export const POST: RequestHandler = async (event) => {
	const actor = requireCapability(event, 'clients:edit');
	const input = await parseJsonBody(event.request, clientSchema);
	return json(await orHttpError(() => createClient(input, actor)), { status: 201 });
};

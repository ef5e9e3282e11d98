import { json } from '@sveltejs/kit';
import { requireCapability } from '$lib/server/auth/guards';
import { parseJsonBody } from '$lib/server/http/parse';
import { siteSchema } from '$lib/schemas/sites';
import { orHttpError } from '$lib/server/http/errors';
import { createSite, listSites } from '$lib/server/services/sites';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async (event) => {
	requireCapability(event, 'sites:read');
	return json(await listSites());
};

/** Positions and heights in metres (x east, y north of the system). */
export const POST: RequestHandler = async (event) => {
	requireCapability(event, 'sites:edit');
	const input = await parseJsonBody(event.request, siteSchema);
	return json(await orHttpError(() => createSite(input)), { status: 201 });
};

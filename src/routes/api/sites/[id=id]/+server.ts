import { json } from '@sveltejs/kit';
import { requireCapability } from '$lib/server/auth/guards';
import { parseJsonBody } from '$lib/server/http/parse';
import { siteSchema, siteUpdateSchema } from '$lib/schemas/sites';
import { orHttpError } from '$lib/server/http/errors';
import { deleteSite, getSite, updateSite } from '$lib/server/services/sites';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async (event) => {
	requireCapability(event, 'sites:read');
	return json(await orHttpError(() => getSite(Number(event.params.id))));
};

/** PUT replaces the whole site (receivers included). */
export const PUT: RequestHandler = async (event) => {
	requireCapability(event, 'sites:edit');
	const input = await parseJsonBody(event.request, siteSchema);
	return json(await orHttpError(() => updateSite(Number(event.params.id), input)));
};

/** PATCH changes the fields sent; receivers, when sent, replace the list. */
export const PATCH: RequestHandler = async (event) => {
	requireCapability(event, 'sites:edit');
	const changes = await parseJsonBody(event.request, siteUpdateSchema);
	return json(await orHttpError(() => updateSite(Number(event.params.id), changes)));
};

/** Quotes evaluated with the site keep their snapshot, so deleting it is safe. */
export const DELETE: RequestHandler = async (event) => {
	requireCapability(event, 'sites:edit');
	await orHttpError(() => deleteSite(Number(event.params.id)));
	return new Response(null, { status: 204 });
};

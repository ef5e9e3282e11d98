import { json } from '@sveltejs/kit';
import { packagePatchSchema } from '$lib/schemas/inventory-packages';
import { requireCapability } from '$lib/server/auth/guards';
import { parseJsonBody } from '$lib/server/http/parse';
import { orHttpError } from '$lib/server/http/errors';
import { packages } from '$lib/server/services/inventory-resources';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async (event) => {
	requireCapability(event, 'inventory:read');
	return json(await orHttpError(() => packages.get(Number(event.params.id))));
};

/** A `groups` array, when given, replaces the package's whole channel plan. */
export const PATCH: RequestHandler = async (event) => {
	const actor = requireCapability(event, 'inventory:edit');
	const changes = await parseJsonBody(event.request, packagePatchSchema);
	return json(await orHttpError(() => packages.update(Number(event.params.id), changes, actor.id)));
};

export const DELETE: RequestHandler = async (event) => {
	requireCapability(event, 'inventory:edit');
	await orHttpError(() => packages.remove(Number(event.params.id)));
	return new Response(null, { status: 204 });
};

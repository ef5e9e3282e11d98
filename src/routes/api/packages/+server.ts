import { json } from '@sveltejs/kit';
import { packageSchema } from '$lib/schemas/inventory-packages';
import { requireCapability } from '$lib/server/auth/guards';
import { parseJsonBody } from '$lib/server/http/parse';
import { orHttpError } from '$lib/server/http/errors';
import { packages } from '$lib/server/services/inventory-resources';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async (event) => {
	requireCapability(event, 'inventory:read');
	return json(await packages.list());
};

/** The body carries the package and its `groups` array (GroupSpec by model ids). */
export const POST: RequestHandler = async (event) => {
	const actor = requireCapability(event, 'inventory:edit');
	const input = await parseJsonBody(event.request, packageSchema);
	return json(await orHttpError(() => packages.create(input, actor.id)), { status: 201 });
};

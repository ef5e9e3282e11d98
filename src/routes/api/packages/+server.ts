import { json } from '@sveltejs/kit';
import { INVENTORY_EDITORS, INVENTORY_READERS } from '$lib/inventory/roles';
import { packageSchema } from '$lib/schemas/inventory-packages';
import { requireRole } from '$lib/server/auth/guards';
import { parseJsonBody } from '$lib/server/http';
import { orHttpError } from '$lib/server/services/errors';
import { packages } from '$lib/server/services/inventory-resources';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async (event) => {
	requireRole(event, ...INVENTORY_READERS);
	return json(await packages.list());
};

/** The body carries the package and its `groups` array (GroupSpec by model ids). */
export const POST: RequestHandler = async (event) => {
	const actor = requireRole(event, ...INVENTORY_EDITORS);
	const input = await parseJsonBody(event.request, packageSchema);
	return json(await orHttpError(() => packages.create(input, actor.id)), { status: 201 });
};

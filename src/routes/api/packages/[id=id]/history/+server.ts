import { json } from '@sveltejs/kit';
import { requireCapability } from '$lib/server/auth/guards';
import { orHttpError } from '$lib/server/http/errors';
import { listHistory } from '$lib/server/services/inventory-history';
import { packages } from '$lib/server/services/inventory-resources';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async (event) => {
	requireCapability(event, 'inventory:read');
	const id = Number(event.params.id);
	await orHttpError(() => packages.get(id)); // 404 for an unknown id, not an empty history
	return json(await listHistory('package', id));
};

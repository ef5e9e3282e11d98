import { json } from '@sveltejs/kit';
import { requireCapability } from '$lib/server/auth/guards';
import { orHttpError } from '$lib/server/http/errors';
import { listHistory } from '$lib/server/services/inventory-history';
import { amplifiers } from '$lib/server/services/inventory-amplifiers';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async (event) => {
	requireCapability(event, 'inventory:read');
	const id = Number(event.params.id);
	await orHttpError(() => amplifiers.get(id)); // 404 for an unknown model, not an empty history
	return json(await listHistory('amplifier', id));
};

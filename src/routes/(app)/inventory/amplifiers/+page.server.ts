import { INVENTORY_READERS } from '$lib/inventory/roles';
import { requireRole } from '$lib/server/auth/guards';
import { amplifiers } from '$lib/server/services/inventory-amplifiers';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	requireRole(event, ...INVENTORY_READERS);
	return { models: await amplifiers.list() };
};

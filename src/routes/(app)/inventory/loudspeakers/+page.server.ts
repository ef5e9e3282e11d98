import { INVENTORY_READERS } from '$lib/inventory/roles';
import { requireRole } from '$lib/server/auth/guards';
import { loudspeakers } from '$lib/server/services/inventory-loudspeakers';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	requireRole(event, ...INVENTORY_READERS);
	return { models: await loudspeakers.list() };
};

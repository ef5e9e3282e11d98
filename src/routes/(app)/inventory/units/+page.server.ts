import { INVENTORY_READERS } from '$lib/inventory/roles';
import { requireRole } from '$lib/server/auth/guards';
import { listUnits } from '$lib/server/services/inventory-units';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	requireRole(event, ...INVENTORY_READERS);
	return { units: await listUnits() };
};

import { requireCapability } from '$lib/server/auth/guards';
import { listStockUnits } from '$lib/server/services/inventory-units';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	requireCapability(event, 'inventory:read');
	return { units: await listStockUnits() };
};

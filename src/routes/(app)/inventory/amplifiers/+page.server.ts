import { requireCapability } from '$lib/server/auth/guards';
import { amplifiers } from '$lib/server/services/inventory-amplifiers';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	requireCapability(event, 'inventory:read');
	return { models: await amplifiers.list() };
};

import { requireCapability } from '$lib/server/auth/guards';
import { loudspeakers } from '$lib/server/services/inventory-loudspeakers';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	requireCapability(event, 'inventory:read');
	return { models: await loudspeakers.list() };
};

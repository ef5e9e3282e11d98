import { can } from '$lib/permissions';
import { requireCapability } from '$lib/server/auth/guards';
import { getSettings } from '$lib/server/services/settings';
import type { LayoutServerLoad } from './$types';

export const load: LayoutServerLoad = async (event) => {
	const user = requireCapability(event, 'inventory:read');
	// Every inventory page shows money in the company's currency.
	return { canEdit: can(user.role, 'inventory:edit'), currency: (await getSettings()).currency };
};

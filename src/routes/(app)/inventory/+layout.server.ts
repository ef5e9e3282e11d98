import { can } from '$lib/permissions';
import { requireCapability } from '$lib/server/auth/guards';
import type { LayoutServerLoad } from './$types';

export const load: LayoutServerLoad = async (event) => {
	const user = requireCapability(event, 'inventory:read');
	return { canEdit: can(user.role, 'inventory:edit') };
};

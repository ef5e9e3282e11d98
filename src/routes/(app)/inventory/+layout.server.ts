import { canEditInventory, INVENTORY_READERS } from '$lib/inventory/roles';
import { requireRole } from '$lib/server/auth/guards';
import type { LayoutServerLoad } from './$types';

export const load: LayoutServerLoad = async (event) => {
	const user = requireRole(event, ...INVENTORY_READERS);
	return { canEdit: canEditInventory(user.role) };
};

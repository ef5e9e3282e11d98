import type { Role } from '$lib/permissions';

/** Staff who may read the inventory (models, packages, stock units, attachments). */
export const INVENTORY_READERS = ['admin', 'warehouse', 'sales'] as const satisfies readonly Role[];

/** Staff who may change it: the warehouse keeps it, the admin may do anything staff can. */
export const INVENTORY_EDITORS = ['admin', 'warehouse'] as const satisfies readonly Role[];

export function canEditInventory(role: Role): boolean {
	return (INVENTORY_EDITORS as readonly Role[]).includes(role);
}

/** Roles and what each may do. Pure: used by server guards and by the navigation alike. */
export const ROLES = ['admin', 'warehouse', 'sales', 'client'] as const;
export type Role = (typeof ROLES)[number];

export const STAFF_ROLES: readonly Role[] = ['admin', 'warehouse', 'sales'];

export function isRole(value: unknown): value is Role {
	return typeof value === 'string' && (ROLES as readonly string[]).includes(value);
}

export function isStaff(role: Role): boolean {
	return STAFF_ROLES.includes(role);
}

export interface NavItem {
	href: string;
	label: string;
	roles: readonly Role[];
}

/** The app's main navigation; each entry is shown only to the roles that may open it. */
export const NAVIGATION: readonly NavItem[] = [
	{ href: '/', label: 'Overview', roles: ['admin', 'warehouse', 'sales', 'client'] },
	{ href: '/quotes', label: 'Quotes', roles: ['admin', 'sales', 'client'] },
	{ href: '/bookings', label: 'Going out', roles: ['admin', 'warehouse', 'sales'] },
	{ href: '/inventory', label: 'Inventory', roles: ['admin', 'warehouse', 'sales'] },
	{ href: '/admin/users', label: 'Users', roles: ['admin'] },
	{ href: '/admin/programmes', label: 'Programmes', roles: ['admin'] },
	{ href: '/admin/settings', label: 'Settings', roles: ['admin'] }
];

export function navigationFor(role: Role): NavItem[] {
	return NAVIGATION.filter((item) => item.roles.includes(role));
}

export const ROLE_LABELS: Record<Role, string> = {
	admin: 'Admin',
	warehouse: 'Warehouse',
	sales: 'Sales desk',
	client: 'Client'
};

/**
 * Roles and the one capability map: what each role may do. Pure, so server guards
 * (`requireCapability`), the navigation and pages all read the same table. No role list is written
 * out anywhere else: a new rule gets a capability here.
 */
export const ROLES = ['admin', 'warehouse', 'sales', 'client'] as const;
export type Role = (typeof ROLES)[number];

export const STAFF_ROLES: readonly Role[] = ['admin', 'warehouse', 'sales'];

export function isRole(value: unknown): value is Role {
	return typeof value === 'string' && (ROLES as readonly string[]).includes(value);
}

export function isStaff(role: Role): boolean {
	return STAFF_ROLES.includes(role);
}

/**
 * Capability → the roles that hold it. `:read` capabilities say who may look; the others who may
 * change. Clients hold quote and booking capabilities only for their own organisation's records
 * (the services scope every query by the client).
 */
export const CAPABILITIES = {
	'overview:read': ['admin', 'warehouse', 'sales', 'client'],
	'inventory:read': ['admin', 'warehouse', 'sales'],
	'inventory:edit': ['admin', 'warehouse'],
	'quotes:read': ['admin', 'sales', 'client'],
	'quotes:write': ['admin', 'sales'],
	'quotes:send': ['admin', 'sales'],
	'quotes:respond': ['client'],
	'quotes:act': ['admin', 'sales', 'client'],
	'invoices:issue': ['admin', 'sales'],
	'evaluations:run': ['admin', 'sales'],
	'sites:read': ['admin', 'warehouse', 'sales'],
	'sites:edit': ['admin', 'sales'],
	'clients:read': ['admin', 'warehouse', 'sales'],
	'clients:edit': ['admin', 'sales'],
	'bookings:read': ['admin', 'warehouse', 'sales'],
	'bookings:handle': ['admin', 'warehouse'],
	'bookings:read-own': ['client'],
	'users:manage': ['admin'],
	'settings:manage': ['admin'],
	'programmes:manage': ['admin']
} as const satisfies Record<string, readonly Role[]>;

export type Capability = keyof typeof CAPABILITIES;

export function can(role: Role | null | undefined, capability: Capability): boolean {
	return role != null && (CAPABILITIES[capability] as readonly Role[]).includes(role);
}

/** True when the role holds at least one of the capabilities. */
export function canAny(role: Role | null | undefined, ...capabilities: Capability[]): boolean {
	return capabilities.some((c) => can(role, c));
}

export interface NavItem {
	href: string;
	label: string;
	capability: Capability;
}

/** The app's main navigation; each entry is shown only to the roles that hold its capability. */
export const NAVIGATION: readonly NavItem[] = [
	{ href: '/', label: 'Overview', capability: 'overview:read' },
	{ href: '/quotes', label: 'Quotes', capability: 'quotes:read' },
	{ href: '/clients', label: 'Clients', capability: 'clients:read' },
	{ href: '/bookings', label: 'Bookings', capability: 'bookings:read' },
	{ href: '/sites', label: 'Sites', capability: 'sites:read' },
	{ href: '/inventory', label: 'Inventory', capability: 'inventory:read' },
	{ href: '/admin/users', label: 'Users', capability: 'users:manage' },
	{ href: '/admin/programmes', label: 'Programmes', capability: 'programmes:manage' },
	{ href: '/admin/settings', label: 'Settings', capability: 'settings:manage' }
];

export function navigationFor(role: Role): NavItem[] {
	return NAVIGATION.filter((item) => can(role, item.capability));
}

export const ROLE_LABELS: Record<Role, string> = {
	admin: 'Admin',
	warehouse: 'Warehouse',
	sales: 'Sales desk',
	client: 'Client'
};

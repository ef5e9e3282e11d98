import { describe, expect, it } from 'vitest';
import { isRole, isStaff, navigationFor, ROLES } from './permissions';

describe('permissions', () => {
	it('knows exactly the four roles', () => {
		expect(ROLES).toEqual(['admin', 'warehouse', 'sales', 'client']);
		expect(isRole('admin')).toBe(true);
		expect(isRole('root')).toBe(false);
	});
	it('treats admin, warehouse and sales as staff, not clients', () => {
		expect(ROLES.filter(isStaff)).toEqual(['admin', 'warehouse', 'sales']);
	});
	it('shows the inventory to staff, never to clients', () => {
		for (const role of ROLES) {
			expect(navigationFor(role).some((item) => item.href === '/inventory')).toBe(role !== 'client');
		}
	});
	it('shows user management only to admins', () => {
		for (const role of ROLES) {
			const hrefs = navigationFor(role).map((item) => item.href);
			expect(hrefs.includes('/admin/users')).toBe(role === 'admin');
		}
	});
});

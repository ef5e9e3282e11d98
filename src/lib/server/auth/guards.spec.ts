import { isHttpError, isRedirect } from '@sveltejs/kit';
import { describe, expect, it } from 'vitest';
import { requireRole } from './guards';
import type { Role } from '$lib/permissions';

function event(path: string, role: Role | null) {
	return {
		url: new URL(`http://127.0.0.1${path}`),
		locals: { user: role ? { id: 1, role, clientId: null, name: 'A', email: 'a@example.test' } : null }
	};
}

function outcome(fn: () => unknown): string {
	try {
		fn();
		return 'ok';
	} catch (thrown) {
		if (isHttpError(thrown)) return String(thrown.status);
		if (isRedirect(thrown)) return `redirect ${thrown.location}`;
		throw thrown;
	}
}

describe('requireRole', () => {
	it('answers 401 to a signed-out API call', () => {
		expect(outcome(() => requireRole(event('/api/users', null), 'admin'))).toBe('401');
	});
	it('sends a signed-out page visit to sign-in, remembering where they were going', () => {
		expect(outcome(() => requireRole(event('/admin/users?x=1', null), 'admin'))).toBe(
			'redirect /signin?redirectTo=%2Fadmin%2Fusers%3Fx%3D1'
		);
	});
	it('answers 403 to the wrong role, page or API', () => {
		expect(outcome(() => requireRole(event('/api/users', 'sales'), 'admin'))).toBe('403');
		expect(outcome(() => requireRole(event('/admin/users', 'client'), 'admin'))).toBe('403');
	});
	it('lets the right role through and returns the user', () => {
		expect(requireRole(event('/api/users', 'admin'), 'admin').role).toBe('admin');
		expect(outcome(() => requireRole(event('/x', 'warehouse'), 'admin', 'warehouse'))).toBe('ok');
	});
});

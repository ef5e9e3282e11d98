import { isHttpError, isRedirect } from '@sveltejs/kit';
import { describe, expect, it } from 'vitest';
import { requireCapability } from './guards';
import type { Role } from '$lib/permissions';

function event(path: string, role: Role | null) {
	return {
		url: new URL(`http://127.0.0.1${path}`),
		locals: {
			user: role ? { id: 1, role, clientId: null, name: 'A', email: 'a@example.test' } : null
		}
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

describe('requireCapability', () => {
	it('answers 401 to a signed-out API call', () => {
		expect(outcome(() => requireCapability(event('/api/users', null), 'users:manage'))).toBe('401');
	});
	it('sends a signed-out page visit to sign-in, remembering where they were going', () => {
		expect(outcome(() => requireCapability(event('/admin/users?x=1', null), 'users:manage'))).toBe(
			'redirect /signin?redirectTo=%2Fadmin%2Fusers%3Fx%3D1'
		);
	});
	it('answers 403 to the wrong role, page or API', () => {
		expect(outcome(() => requireCapability(event('/api/users', 'sales'), 'users:manage'))).toBe(
			'403'
		);
		expect(outcome(() => requireCapability(event('/admin/users', 'client'), 'users:manage'))).toBe(
			'403'
		);
	});
	it('lets the right role through and returns the user', () => {
		expect(requireCapability(event('/api/users', 'admin'), 'users:manage').role).toBe('admin');
		expect(outcome(() => requireCapability(event('/x', 'warehouse'), 'inventory:edit'))).toBe('ok');
	});
});

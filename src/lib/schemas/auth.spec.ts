import { describe, expect, it } from 'vitest';
import { safeRedirectPath, signInSchema } from './auth';

describe('sign-in input', () => {
	it('normalises the e-mail', () => {
		expect(signInSchema.parse({ email: ' Sales@Kestrel-Yard.TEST ', password: 'x' }).email).toBe(
			'sales@kestrel-yard.test'
		);
	});
	it('names each missing field', () => {
		const result = signInSchema.safeParse({ email: 'not-an-email', password: '' });
		expect(result.success).toBe(false);
		expect(result.error!.issues.map((i) => i.path[0]).sort()).toEqual(['email', 'password']);
	});
	it('only redirects within the site after sign-in', () => {
		expect(safeRedirectPath('/quotes/4')).toBe('/quotes/4');
		expect(safeRedirectPath('https://evil.example')).toBe('/');
		expect(safeRedirectPath('//evil.example')).toBe('/');
		expect(safeRedirectPath('/\\evil.example')).toBe('/');
		expect(safeRedirectPath(null)).toBe('/');
	});
});

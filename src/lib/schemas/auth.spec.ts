import { describe, expect, it } from 'vitest';
import { signInSchema } from './auth';

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
});

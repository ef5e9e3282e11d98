import { describe, expect, it } from 'vitest';
import { hashPassword, verifyPassword } from './password';

describe('password hashing off the main thread', () => {
	it('hashes with bcrypt cost 10 and verifies', async () => {
		const hash = await hashPassword('correct horse battery');
		expect(hash).toMatch(/^\$2[aby]\$10\$/);
		expect(await verifyPassword('correct horse battery', hash)).toBe(true);
		expect(await verifyPassword('wrong', hash)).toBe(false);
	});

	it('keeps the event loop free while it hashes', async () => {
		let ticks = 0;
		const timer = setInterval(() => ticks++, 5);
		await Promise.all(Array.from({ length: 4 }, (_, i) => hashPassword(`pw-${i}`)));
		clearInterval(timer);
		// Four hashes take a few hundred ms; a blocked loop would not tick in between.
		expect(ticks).toBeGreaterThan(10);
	});

	it('answers false for a malformed hash instead of failing the sign-in', async () => {
		await expect(verifyPassword('x', 'not-a-hash')).resolves.toBe(false);
	});
});

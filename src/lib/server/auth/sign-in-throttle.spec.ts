import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { useTestDatabase } from '../../../../tests/helpers/db';
import { ACCOUNT_RULE, ADDRESS_RULE } from '$lib/sign-in-backoff';
import { signInWaitSeconds, throttledSignIn } from './sign-in-throttle';

useTestDatabase();

// Documentation-range addresses (RFC 5737), new for every run so earlier runs never interfere.
const address = () => `198.51.100.${Math.floor(Math.random() * 250)}-${randomUUID().slice(0, 6)}`;
const email = () => `throttle-${randomUUID().slice(0, 8)}@example.test`;
const refused = (e: string, a: string) => throttledSignIn(e, a, async () => 'no', () => 'refused');

describe('sign-in throttle (MariaDB-backed)', () => {
	it('locks one e-mail after its free failures, whatever the address, and says for how long', async () => {
		const who = email();
		for (let i = 0; i < ACCOUNT_RULE.freeFailures; i++) expect((await refused(who, address())).throttled).toBe(false);
		const next = await throttledSignIn(who, address(), async () => 'would have checked', () => 'signed-in');
		expect(next).toEqual({ throttled: true, retryAfterSeconds: ACCOUNT_RULE.firstLockSeconds });
		expect(await signInWaitSeconds(who.toUpperCase(), address())).toBeGreaterThan(0);
	});

	it('locks one address that tries many different e-mails', async () => {
		const from = address();
		for (let i = 0; i < ADDRESS_RULE.freeFailures; i++) expect((await refused(email(), from)).throttled).toBe(false);
		expect((await refused(email(), from)).throttled).toBe(true);
		expect(await signInWaitSeconds(email(), address())).toBe(0);
	});

	it('a good sign-in forgets the e-mail’s earlier failures', async () => {
		const who = email();
		const from = address();
		for (let i = 0; i < ACCOUNT_RULE.freeFailures - 1; i++) await refused(who, from);
		await throttledSignIn(who, from, async () => 'ok', () => 'signed-in');
		for (let i = 0; i < ACCOUNT_RULE.freeFailures - 1; i++) expect((await refused(who, from)).throttled).toBe(false);
	});

	it('attempts that never reached a password check are not counted', async () => {
		const who = email();
		for (let i = 0; i < ACCOUNT_RULE.freeFailures + 2; i++) {
			expect((await throttledSignIn(who, address(), async () => 'x', () => 'not-checked')).throttled).toBe(false);
		}
	});

	it('a burst sent all at once cannot slip past the lock: at most the free tries are checked', async () => {
		const who = email();
		let checked = 0;
		const slow = async () => {
			checked++;
			await new Promise((r) => setTimeout(r, 200));
			return 'no';
		};
		const answers = await Promise.all(Array.from({ length: 20 }, () => throttledSignIn(who, address(), slow, () => 'refused')));
		expect(checked).toBeLessThanOrEqual(ACCOUNT_RULE.freeFailures);
		expect(answers.filter((a) => a.throttled).length).toBeGreaterThanOrEqual(20 - ACCOUNT_RULE.freeFailures);
	});
});

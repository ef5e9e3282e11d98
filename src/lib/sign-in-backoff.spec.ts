import { describe, expect, it } from 'vitest';
import { ACCOUNT_RULE, lockoutSeconds, retryMessage } from './sign-in-backoff';

describe('sign-in back-off', () => {
	const rule = { freeFailures: 5, firstLockSeconds: 15, maxLockSeconds: 900 };

	it('lets the first few failures through without a wait', () => {
		for (let n = 0; n < 5; n++) expect(lockoutSeconds(n, rule)).toBe(0);
	});

	it('doubles the wait with every further failure, up to the cap', () => {
		expect([5, 6, 7, 8, 9, 10, 11, 12, 40].map((n) => lockoutSeconds(n, rule))).toEqual([15, 30, 60, 120, 240, 480, 900, 900, 900]);
	});

	it('the account rule locks after five failures', () => {
		expect(lockoutSeconds(ACCOUNT_RULE.freeFailures - 1, ACCOUNT_RULE)).toBe(0);
		expect(lockoutSeconds(ACCOUNT_RULE.freeFailures, ACCOUNT_RULE)).toBeGreaterThan(0);
	});

	it('tells people calmly when to try again, in words', () => {
		expect(retryMessage(1)).toBe('Too many sign-in attempts. Please try again in 1 second.');
		expect(retryMessage(14.2)).toBe('Too many sign-in attempts. Please try again in 15 seconds.');
		expect(retryMessage(60)).toBe('Too many sign-in attempts. Please try again in 1 minute.');
		expect(retryMessage(61)).toBe('Too many sign-in attempts. Please try again in 2 minutes.');
	});
});

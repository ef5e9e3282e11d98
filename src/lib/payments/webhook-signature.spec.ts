import { describe, expect, it } from 'vitest';
import { MAX_FUTURE_SKEW_S, signedTooFarAhead, signatureTimestamp } from './webhook-signature';

describe('webhook signature time', () => {
	const now = 1_900_000_000;
	it('reads t= from the Stripe-Signature header', () => {
		expect(signatureTimestamp(`t=${now},v1=abc,v0=def`)).toBe(now);
		expect(signatureTimestamp('v1=abc')).toBeNull();
		expect(signatureTimestamp('t=soon,v1=abc')).toBeNull();
	});
	it('refuses a signature dated more than five minutes ahead; a little clock skew is fine', () => {
		expect(MAX_FUTURE_SKEW_S).toBe(300);
		expect(signedTooFarAhead(`t=${now + 301},v1=x`, now)).toBe(true);
		expect(signedTooFarAhead(`t=${now + 300},v1=x`, now)).toBe(false);
		expect(signedTooFarAhead(`t=${now - 30},v1=x`, now)).toBe(false);
		expect(signedTooFarAhead('v1=x', now)).toBe(true);
	});
});

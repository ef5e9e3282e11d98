/**
 * The Stripe SDK refuses signatures older than its tolerance (5 minutes) but not ones dated in the
 * future, which a leaked signing secret could use to mint events that stay "fresh" for a long time.
 */
export const MAX_FUTURE_SKEW_S = 300;

/** The `t=` (Unix seconds) of a Stripe-Signature header, or null. */
export function signatureTimestamp(header: string): number | null {
	const part = header.split(',').find((p) => p.trim().startsWith('t='));
	const value = part ? Number(part.trim().slice(2)) : NaN;
	return Number.isInteger(value) ? value : null;
}

export function signedTooFarAhead(header: string, nowS: number): boolean {
	const t = signatureTimestamp(header);
	return t === null || t - nowS > MAX_FUTURE_SKEW_S;
}

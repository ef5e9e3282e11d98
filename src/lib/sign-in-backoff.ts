/**
 * How long sign-in waits after repeated failures: a few free tries (people mistype), then a lock
 * that doubles with each further failure up to a cap. Pure; the server keeps the counts.
 */
export interface BackoffRule {
	/** Failures allowed before any wait. */
	freeFailures: number;
	firstLockSeconds: number;
	maxLockSeconds: number;
}

/** Per e-mail address tried (whether or not an account has it, so nothing is revealed). */
export const ACCOUNT_RULE: BackoffRule = { freeFailures: 5, firstLockSeconds: 15, maxLockSeconds: 15 * 60 };
/** Per client address: generous, since an office or venue may share one address. */
export const ADDRESS_RULE: BackoffRule = { freeFailures: 30, firstLockSeconds: 15, maxLockSeconds: 15 * 60 };
/** Failures are forgotten this long after the first one of a run (or at once on a good sign-in). */
export const FAILURE_WINDOW_SECONDS = 24 * 60 * 60;

export function lockoutSeconds(failures: number, rule: BackoffRule): number {
	if (failures < rule.freeFailures) return 0;
	const doublings = Math.min(failures - rule.freeFailures, 30);
	return Math.min(rule.firstLockSeconds * 2 ** doublings, rule.maxLockSeconds);
}

export function retryMessage(seconds: number): string {
	const s = Math.max(1, Math.ceil(seconds));
	const when = s < 60 ? `${s} second${s === 1 ? '' : 's'}` : `${Math.ceil(s / 60)} minute${Math.ceil(s / 60) === 1 ? '' : 's'}`;
	return `Too many sign-in attempts. Please try again in ${when}.`;
}

/**
 * What the route matrix expects of a cell, in a small vocabulary, and how an answer is judged.
 *   ok      — 2xx, or a 3xx that is not to sign-in
 *   denied  — 403
 *   signin  — 401, or a redirect to /signin
 *   missing — 404
 *   allowed — got past the guard: anything but 401 / 403 / sign-in (a 400/409/422 refusal counts)
 *   a number — exactly that status
 * A 5xx never matches anything.
 */
import { BASE_URL } from '../browser';

export type AccessOutcome = 'ok' | 'denied' | 'signin' | 'missing' | 'allowed';
export type Expected = AccessOutcome | number;

export interface Observed {
	status: number;
	/** Where a redirect pointed, if it was one. */
	location: string | null;
	/** What to print when the cell is wrong. */
	detail: string;
}

/** A redirect's target as a path on this app (SvelteKit sends some absolute, some relative), or null. */
function localPath(location: string | null): string | null {
	if (!location) return null;
	const url = new URL(location, BASE_URL);
	return url.origin === new URL(BASE_URL).origin ? url.pathname : null;
}

export function toSignin(o: Observed): boolean {
	const redirect = o.status >= 300 && o.status < 400;
	return o.status === 401 || (redirect && (localPath(o.location) ?? '').startsWith('/signin'));
}

export function matches(expected: Expected, o: Observed): boolean {
	if (o.status >= 500) return false;
	const signin = toSignin(o);
	switch (expected) {
		case 'ok':
			return o.status < 400 && !signin;
		case 'denied':
			return o.status === 403;
		case 'signin':
			return signin;
		case 'missing':
			return o.status === 404;
		case 'allowed':
			return !signin && o.status !== 403;
		default:
			return o.status === expected;
	}
}

/** A short name for what came back, in the table's own words where one fits. */
export function describe(o: Observed): string {
	if (toSignin(o)) return `signin (${o.status})`;
	if (o.status >= 300 && o.status < 400) return `ok (${o.status} → ${o.location})`;
	return String(o.status);
}

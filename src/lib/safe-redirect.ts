/**
 * Where a person may be sent after signing in (or opening a sign-in link): only a path on this
 * site. Browsers strip tabs and newlines from URLs and read `\` as `/`, so `/\t/evil.example` and
 * `/\evil.example` both mean `//evil.example`, another site; such targets, control characters and
 * anything with a scheme or host give the home page instead. Pure, so the same rule holds wherever
 * a redirect target comes from.
 */
const MAX_LENGTH = 2000;
const PROBE_ORIGIN = 'http://throwline.invalid';

export function safeRedirectPath(target: string | null | undefined): string {
	if (typeof target !== 'string' || target.length === 0 || target.length > MAX_LENGTH) return '/';
	// Any control character, space-like trickery at the ends, or backslash: refuse outright.
	if (/[\u0000-\u001f\u007f\\]/.test(target) || target !== target.trim()) return '/';
	if (!target.startsWith('/') || target.startsWith('//')) return '/';
	let url: URL;
	try {
		url = new URL(target, PROBE_ORIGIN);
	} catch {
		return '/';
	}
	if (url.origin !== PROBE_ORIGIN) return '/';
	const path = url.pathname + url.search + url.hash;
	// A dot segment can collapse to `//host` (e.g. `/.//host`); the normalised path must start with one slash.
	return path.startsWith('//') ? '/' : path;
}

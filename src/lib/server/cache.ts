/**
 * A small in-process cache for data that changes rarely and is read on every evaluation (the
 * catalogue, settings, programme profiles). Entries live a few seconds at most and are dropped at
 * once by the writes that change them; with several processes, `cache-stamps.ts` drops the families
 * another process changed at the start of each request.
 */
const TTL_MS = 5000;

/** Key prefix of the quoting engine's view of packages and models. */
export const CATALOGUE = 'catalogue:';
/** Key prefix of confirmed bookings as the evaluations read them. */
export const BOOKINGS = 'bookings:';
const MAX_ENTRIES = 5000;
const entries = new Map<string, { expires: number; value: Promise<unknown> }>();

/** Keys for sessions and date ranges are many and short-lived: drop the expired ones now and then. */
function prune(now: number): void {
	for (const [key, entry] of entries) if (entry.expires <= now) entries.delete(key);
}

export function cached<T>(key: string, load: () => Promise<T>): Promise<T> {
	const now = Date.now();
	const hit = entries.get(key);
	if (hit && hit.expires > now) return hit.value as Promise<T>;
	if (entries.size > MAX_ENTRIES) prune(now);
	const value = load();
	entries.set(key, { expires: now + TTL_MS, value });
	value.catch(() => entries.delete(key)); // never keep a failure
	return value;
}

/** Drops every entry whose key starts with the prefix (e.g. "catalogue:"). */
export function invalidate(prefix: string): void {
	for (const key of entries.keys()) if (key.startsWith(prefix)) entries.delete(key);
}

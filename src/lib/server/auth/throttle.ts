/**
 * Throttles for the "e-mail me a link" requests, per network address and per e-mail address. Kept in
 * this process's memory for now (rate-limiter-flexible's memory store): a restart forgets the counts,
 * and several app processes would each count on their own. Separate from the sign-in throttle.
 */
import { RateLimiterMemory, RateLimiterRes } from 'rate-limiter-flexible';

const perNetworkAddress = new RateLimiterMemory({ keyPrefix: 'link-ip', points: 30, duration: 15 * 60 });
const perEmailAddress = new RateLimiterMemory({ keyPrefix: 'link-email', points: 3, duration: 60 * 60 });

export type ThrottleDecision = { ok: true } | { ok: false; who: 'network' | 'email'; retryAfterS: number };

async function take(limiter: RateLimiterMemory, key: string): Promise<number | null> {
	try {
		await limiter.consume(key);
		return null;
	} catch (refusal) {
		if (refusal instanceof RateLimiterRes) return Math.ceil(refusal.msBeforeNext / 1000);
		throw refusal;
	}
}

/** Counts one request; the network address is checked first so a flood never touches the per-e-mail count. */
export async function throttleLinkRequest(networkAddress: string, email: string): Promise<ThrottleDecision> {
	const network = await take(perNetworkAddress, networkAddress);
	if (network !== null) return { ok: false, who: 'network', retryAfterS: network };
	const perEmail = await take(perEmailAddress, email.toLowerCase());
	if (perEmail !== null) return { ok: false, who: 'email', retryAfterS: perEmail };
	return { ok: true };
}

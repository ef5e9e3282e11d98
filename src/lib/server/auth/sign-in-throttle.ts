/**
 * Sign-in throttling per e-mail tried and per client address, kept in MariaDB (so it holds across
 * app processes) through rate-limiter-flexible. Every route that checks a password goes through
 * `throttledSignIn`: a locked key answers "wait" before any password is hashed; failures count and
 * lock with back-off (src/lib/sign-in-backoff.ts); a good sign-in clears the account's count.
 * Unknown e-mails are counted exactly like real ones, so the answers reveal nothing.
 */
import { createHash } from 'node:crypto';
import type { RateLimiterRes } from 'rate-limiter-flexible';
import { ACCOUNT_RULE, ADDRESS_RULE, FAILURE_WINDOW_SECONDS, lockoutSeconds, type BackoffRule } from '$lib/sign-in-backoff';
import { env } from '$env/dynamic/private';
import type { Sequelize } from 'sequelize';
import { createSequelize, databaseConfigFrom } from '../db/connection';
import { RateLimiterMariaDb } from './throttle-store';

interface Dimension {
	rule: BackoffRule;
	failures: RateLimiterMariaDb;
	lock: RateLimiterMariaDb;
}

let dimensions: { account: Dimension; address: Dimension } | undefined;

// Its own small pool: a flood of sign-ins all updating one address's row queue on that row lock
// while holding connections; in the app's pool they would starve every other request.
const cache = globalThis as unknown as { throwlineThrottleSequelize?: Sequelize };
function throttleDb(): Sequelize {
	cache.throwlineThrottleSequelize ??= createSequelize(databaseConfigFrom(env), { pool: { max: 4, acquire: 10_000 } });
	return cache.throwlineThrottleSequelize;
}

function dimension(name: string, rule: BackoffRule): Dimension {
	const storeClient = throttleDb();
	return {
		rule,
		failures: new RateLimiterMariaDb({ storeClient, keyPrefix: `${name}-failures`, points: 1_000_000, duration: FAILURE_WINDOW_SECONDS }),
		lock: new RateLimiterMariaDb({ storeClient, keyPrefix: `${name}-lock`, points: 1, duration: 1 })
	};
}

function limiters() {
	dimensions ??= { account: dimension('account', ACCOUNT_RULE), address: dimension('address', ADDRESS_RULE) };
	return dimensions;
}

// E-mails are stored only as a hash: the throttle table never lists who was tried.
const accountKey = (email: string) => createHash('sha256').update(email.trim().toLowerCase()).digest('hex');

async function lockedMs(d: Dimension, key: string): Promise<number> {
	const res: RateLimiterRes | null = await d.lock.get(key);
	return res && res.consumedPoints > d.lock.points ? res.msBeforeNext : 0;
}

/** Counts one attempt; answers the lock it earns if it fails (0 while still within the free tries). */
async function count(d: Dimension, key: string): Promise<{ failures: number; lockSeconds: number }> {
	const failures = (await d.failures.penalty(key, 1)).consumedPoints;
	return { failures, lockSeconds: lockoutSeconds(failures, d.rule) };
}

/** Seconds to wait before this e-mail may be tried from this address (0 = go ahead). */
export async function signInWaitSeconds(email: string, address: string): Promise<number> {
	const { account, address: byAddress } = limiters();
	const ms = Math.max(await lockedMs(account, accountKey(email)), await lockedMs(byAddress, address));
	return ms > 0 ? Math.ceil(ms / 1000) : 0;
}

export type AttemptOutcome = 'signed-in' | 'refused' | 'not-checked';

export type ThrottledResult<T> = { throttled: true; retryAfterSeconds: number } | { throttled: false; value: T };

/**
 * Runs one sign-in attempt unless the e-mail or address is locked; `classify` says how it went.
 * Attempts that never reached a password check (database down, bad form) are not counted.
 */
export async function throttledSignIn<T>(
	email: string,
	address: string,
	attempt: () => Promise<T>,
	classify: (value: T) => AttemptOutcome
): Promise<ThrottledResult<T>> {
	const wait = await signInWaitSeconds(email, address);
	if (wait > 0) return { throttled: true, retryAfterSeconds: wait };
	// Count the attempt before checking the password: many sent at once cannot all slip past the
	// lock that the first failures are about to set. A good or unchecked attempt gives it back.
	const { account, address: byAddress } = limiters();
	const key = accountKey(email);
	const [byAccountCount, byAddressCount] = [await count(account, key), await count(byAddress, address)];
	const lockFor = async () => {
		if (byAccountCount.lockSeconds > 0) await account.lock.block(key, byAccountCount.lockSeconds);
		if (byAddressCount.lockSeconds > 0) await byAddress.lock.block(address, byAddressCount.lockSeconds);
	};
	const beyond = byAccountCount.failures > account.rule.freeFailures || byAddressCount.failures > byAddress.rule.freeFailures;
	if (beyond) {
		await lockFor();
		return { throttled: true, retryAfterSeconds: Math.max(byAccountCount.lockSeconds, byAddressCount.lockSeconds) };
	}
	const value = await attempt();
	const outcome = classify(value);
	if (outcome === 'refused') {
		await lockFor();
	} else if (outcome === 'signed-in') {
		await account.failures.delete(key);
		await byAddress.failures.reward(address, 1);
	} else {
		await account.failures.reward(key, 1);
		await byAddress.failures.reward(address, 1);
	}
	return { throttled: false, value };
}

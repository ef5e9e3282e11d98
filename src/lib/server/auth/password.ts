import { compareOffThread, hashOffThread } from './hash-worker';

// Cost 10 keeps a sign-in near 60 ms on one core: slow for an attacker, fine for a desk. The hashing
// runs on a worker thread (hash-worker.ts) so that other requests are not kept waiting.
const COST = 10;

export function hashPassword(plain: string): Promise<string> {
	return hashOffThread(plain, COST);
}

export function verifyPassword(plain: string, hash: string): Promise<boolean> {
	return compareOffThread(plain, hash);
}

// Compared against when the e-mail is unknown or the account inactive, so that every refusal
// takes the same time and gives nothing away. Made once, lazily, from a random string.
let decoyHash: Promise<string> | undefined;
export function decoyHashOnce(): Promise<string> {
	decoyHash ??= hashPassword(crypto.randomUUID());
	return decoyHash;
}

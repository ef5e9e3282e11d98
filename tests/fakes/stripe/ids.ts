// Stripe-like random ids (prefix + 24 base62 chars). Random rather than sequential so ids never repeat
// after a reset, since the app's database may still hold ids from an earlier run.
import { randomBytes } from 'node:crypto';

const ALPHABET = '0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz';

export function randomToken(length = 24): string {
	const bytes = randomBytes(length);
	let out = '';
	for (const b of bytes) out += ALPHABET[b % ALPHABET.length];
	return out;
}

export function newId(prefix: string): string {
	return `${prefix}_${randomToken()}`;
}

export function nowSeconds(): number {
	return Math.floor(Date.now() / 1000);
}

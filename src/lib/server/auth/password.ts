import bcrypt from 'bcryptjs';

// Cost 10 keeps a sign-in near 60 ms on one core: slow for an attacker, fine for a desk.
const COST = 10;

export function hashPassword(plain: string): Promise<string> {
	return bcrypt.hash(plain, COST);
}

export function verifyPassword(plain: string, hash: string): Promise<boolean> {
	return bcrypt.compare(plain, hash);
}

// Compared against when the e-mail is unknown or the account inactive, so that every refusal
// takes the same time and gives nothing away. Made once, lazily, from a random string.
let decoyHash: string | undefined;
export function decoyHashOnce(): string {
	decoyHash ??= bcrypt.hashSync(crypto.randomUUID(), COST);
	return decoyHash;
}

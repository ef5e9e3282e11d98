/**
 * Getting back in: "e-mail me a sign-in link" (client accounts only) and "reset my password" (anyone).
 * Both answer the same whatever the address, so they tell nobody which addresses have accounts.
 */
import { safeRedirectPath } from '$lib/safe-redirect';
import { createSignInLink } from '../auth/sign-in-links';
import { issuePasswordReset, RESET_VALID_MINUTES } from '../auth/password-resets';
import { throttleLinkRequest, type ThrottleDecision } from '../auth/throttle';
import { User } from '../db';
import { passwordResetEmail, signInLinkEmail } from '../mail/access-emails';
import { sendEmail } from '../mail/outbox';
import { DomainError } from './errors';
import { getSettings } from './settings';

/** Only a flood from one network address is refused out loud (429); everything else looks the same. */
async function throttled(networkAddress: string, email: string): Promise<boolean> {
	const verdict: ThrottleDecision = await throttleLinkRequest(networkAddress, email);
	if (!verdict.ok && verdict.who === 'network') {
		throw new DomainError(429, `Too many requests from here. Try again in ${Math.ceil(verdict.retryAfterS / 60)} minutes.`);
	}
	return !verdict.ok;
}

export async function requestSignInLink(email: string, redirectTo: string | undefined, networkAddress: string): Promise<void> {
	if (await throttled(networkAddress, email)) return;
	const user = await User.findOne({ where: { email: email.toLowerCase(), active: true } });
	// Sign-in links are only ever for client accounts: staff sign in with their password (or reset it).
	if (!user || user.role !== 'client') return;
	const token = await createSignInLink(user.id, safeRedirectPath(redirectTo));
	await sendEmail(signInLinkEmail(user.email, token, (await getSettings()).companyName));
}

export async function requestPasswordReset(email: string, networkAddress: string): Promise<void> {
	if (await throttled(networkAddress, email)) return;
	const user = await User.findOne({ where: { email: email.toLowerCase(), active: true } });
	if (!user) return;
	await sendReset(user, false);
}

/** An admin sends a reset link to someone (e.g. who has forgotten their password). */
export async function sendPasswordResetTo(userId: number): Promise<{ email: string; sent: boolean }> {
	const user = await User.findByPk(userId);
	if (!user) throw new DomainError(404, 'No such user.');
	if (!user.active) throw new DomainError(409, 'Restore the account before sending it a reset link.');
	return { email: user.email, sent: await sendReset(user, true) };
}

async function sendReset(user: User, byAdmin: boolean): Promise<boolean> {
	const token = await issuePasswordReset(user.id);
	const company = (await getSettings()).companyName;
	return (await sendEmail(passwordResetEmail(user.email, token, RESET_VALID_MINUTES, company, byAdmin))).sent;
}

import type { EmailMessage } from './outbox';
import { publicOrigin } from './transport';

/** A sign-in link asked for from the sign-in page; it lands where the person was going. */
export function signInLinkEmail(to: string, token: string, company: string): EmailMessage {
	const link = `${publicOrigin()}/signin/link/${token}`;
	return {
		to,
		subject: `Your sign-in link for ${company}`,
		text: [
			'You asked for a link to sign in to your quotes and bookings.',
			`Open it to sign in (it works once):\n${link}`,
			'Once signed in you can choose a password under “Your account”, so you need no link next time.',
			'If you did not ask for this, ignore this e-mail: nothing changes.',
			company
		].join('\n\n')
	};
}

/** A password-reset link (asked for by the person, or sent by an admin). */
export function passwordResetEmail(to: string, token: string, validMinutes: number, company: string, byAdmin: boolean): EmailMessage {
	const link = `${publicOrigin()}/signin/reset/${token}`;
	return {
		to,
		subject: `Choose a new password for ${company}`,
		text: [
			byAdmin ? 'Your Throwline admin has sent you a link to choose a new password.' : 'You asked to reset your password.',
			`Choose a new one here (the link works once, for ${validMinutes} minutes):\n${link}`,
			'Your current password keeps working until you choose a new one. If you did not ask for this, ignore this e-mail.',
			company
		].join('\n\n')
	};
}

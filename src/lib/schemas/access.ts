import { z } from 'zod';

const email = z.string().trim().toLowerCase().max(254).pipe(z.email('Enter the e-mail address you sign in with'));

/** "E-mail me a sign-in link" and "reset my password": only an address (and where to land). */
export const linkRequestSchema = z.object({
	email,
	redirectTo: z.string().max(500).optional()
});

const newPassword = z.string().min(10, 'Use at least 10 characters').max(200, 'At most 200 characters');

/** Choosing a password: twice, so a typo does not lock the person out. */
export const newPasswordSchema = z
	.object({ password: newPassword, confirm: z.string().max(200) })
	.refine((p) => p.password === p.confirm, { path: ['confirm'], message: 'The two passwords differ' });

/** Setting one's own password while signed in; staff also give the current one. */
export const ownPasswordSchema = z
	.object({ current: z.string().max(200).default(''), password: newPassword, confirm: z.string().max(200) })
	.refine((p) => p.password === p.confirm, { path: ['confirm'], message: 'The two passwords differ' });

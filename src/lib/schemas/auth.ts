import { z } from 'zod';

export const signInSchema = z.object({
	email: z.string().trim().toLowerCase().max(254).pipe(z.email('Enter the e-mail address you sign in with')),
	password: z.string().min(1, 'Enter your password').max(200),
	redirectTo: z.string().max(500).optional()
});
export type SignInInput = z.infer<typeof signInSchema>;

/** Only same-site paths may be used after sign-in, so a crafted link cannot send people elsewhere. */
export function safeRedirectPath(target: string | undefined | null): string {
	if (!target || !target.startsWith('/') || target.startsWith('//') || target.startsWith('/\\')) {
		return '/';
	}
	return target;
}

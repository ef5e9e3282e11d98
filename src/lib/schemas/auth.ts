import { z } from 'zod';

export const signInSchema = z.object({
	email: z.string().trim().toLowerCase().max(254).pipe(z.email('Enter the e-mail address you sign in with')),
	password: z.string().min(1, 'Enter your password').max(200),
	redirectTo: z.string().max(500).optional()
});

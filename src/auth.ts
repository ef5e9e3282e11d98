import { SvelteKitAuth, CredentialsSignin } from '@auth/sveltekit';
import Credentials from '@auth/sveltekit/providers/credentials';
import { safeRedirectPath } from '$lib/safe-redirect';
import { signInSchema } from '$lib/schemas/auth';
import { checkCredentials } from '$lib/server/auth/credentials';
import { consumeSignInLink } from '$lib/server/auth/sign-in-links';

class InactiveAccount extends CredentialsSignin {
	code = 'inactive';
}

export const { handle, signIn, signOut } = SvelteKitAuth({
	trustHost: true,
	session: { strategy: 'jwt', maxAge: 12 * 60 * 60 },
	pages: { signIn: '/signin', error: '/signin' },
	providers: [
		Credentials({
			credentials: { email: {}, password: {} },
			async authorize(raw) {
				const parsed = signInSchema.safeParse(raw);
				if (!parsed.success) return null;
				const result = await checkCredentials(parsed.data.email, parsed.data.password);
				if (result.ok) return result.user;
				if (result.reason === 'inactive') throw new InactiveAccount();
				return null;
			}
		}),
		// The one-time link e-mailed with a quote (see sign-in-links.ts).
		Credentials({
			id: 'link',
			name: 'Sign-in link',
			credentials: { token: {} },
			authorize: (raw) => consumeSignInLink(String(raw?.token ?? ''))
		})
	],
	callbacks: {
		// Every redirect Auth.js makes (its callbackUrl / redirectTo included) stays on this site.
		redirect({ url, baseUrl }) {
			const path = url.startsWith(baseUrl) ? url.slice(baseUrl.length) || '/' : url;
			return baseUrl + safeRedirectPath(path);
		},
		jwt({ token, user }) {
			if (user) {
				token.sub = user.id;
				token.role = (user as { role?: string }).role;
				// Compared with the user's row on every request (hooks/attach-user.ts).
				token.sessionVersion = (user as { sessionVersion?: number }).sessionVersion;
			}
			return token;
		},
		session({ session, token }) {
			if (session.user) {
				session.user.id = token.sub ?? '';
				(session.user as { role?: unknown }).role = token.role;
				(session as { sessionVersion?: unknown }).sessionVersion = token.sessionVersion;
			}
			return session;
		}
	}
});

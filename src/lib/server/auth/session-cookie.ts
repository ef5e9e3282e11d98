/**
 * Re-issues the current session cookie with a new session version, so the person who just changed
 * their own password stays signed in here while every other session of theirs (issued with the old
 * version) stops working on its next request.
 */
import type { Cookies } from '@sveltejs/kit';
import { decode, encode } from '@auth/core/jwt';
import { env } from '$env/dynamic/private';
import { SESSION_COOKIES } from './signed-in-user';

/** The same lifetime the Auth.js configuration gives sessions (src/auth.ts). */
const MAX_AGE_S = 12 * 60 * 60;

export async function reissueSessionCookie(cookies: Cookies, sessionVersion: number): Promise<void> {
	const secret = env.AUTH_SECRET;
	if (!secret) return;
	for (const name of SESSION_COOKIES) {
		const token = cookies.get(name);
		if (!token) continue;
		const claims = await decode({ token, secret, salt: name });
		if (!claims) return;
		const fresh = await encode({ token: { ...claims, sessionVersion }, secret, salt: name, maxAge: MAX_AGE_S });
		cookies.set(name, fresh, {
			path: '/',
			httpOnly: true,
			sameSite: 'lax',
			secure: name.startsWith('__Secure-'),
			maxAge: MAX_AGE_S
		});
		return;
	}
}

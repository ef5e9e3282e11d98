import { fail, isRedirect, redirect } from '@sveltejs/kit';
import { message, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import type { CredentialsSignin } from '@auth/sveltekit';
import { signIn } from '../../../auth';
import { safeRedirectPath } from '$lib/safe-redirect';
import { signInSchema } from '$lib/schemas/auth';
import { isDatabaseDown } from '$lib/server/health';
import { throttledSignIn } from '$lib/server/auth/sign-in-throttle';
import { retryMessage } from '$lib/sign-in-backoff';
import { DATABASE_DOWN_MESSAGE } from '../../../hooks/unavailable';
import type { Actions, PageServerLoad } from './$types';

const NOT_RECOGNISED = 'That e-mail and password do not match an account. Check both and try again.';
const INACTIVE = 'This account has been deactivated. Ask your Throwline admin to restore it.';

export const load: PageServerLoad = async ({ locals, url }) => {
	const redirectTo = safeRedirectPath(url.searchParams.get('redirectTo'));
	if (locals.user) redirect(303, redirectTo);
	const form = await superValidate({ redirectTo }, zod4(signInSchema), { errors: false });
	return { form };
};

export const actions: Actions = {
	default: async (event) => {
		const form = await superValidate(event.request, zod4(signInSchema));
		const password = form.data.password;
		form.data.password = ''; // never echo a password back to the page
		if (!form.valid) return fail(400, { form });

		// Hand the checked fields to Auth.js's credentials callback; it sets the session cookie.
		const headers = new Headers(event.request.headers);
		headers.delete('content-type');
		const body = new FormData();
		body.set('providerId', 'credentials');
		body.set('email', form.data.email);
		body.set('password', password);
		body.set('redirectTo', safeRedirectPath(form.data.redirectTo));
		const request = new Request(event.request.url, { method: 'POST', headers, body });

		// Auth.js answers by throwing: a redirect on success, CredentialsSignin on a refusal.
		let attempt;
		try {
			attempt = await throttledSignIn(
				form.data.email,
				event.getClientAddress(),
				async () => {
					try {
						await signIn({ ...event, request });
						return undefined;
					} catch (thrown) {
						return thrown;
					}
				},
				(thrown) => (isRedirect(thrown) ? 'signed-in' : isCredentialsSignin(thrown) && thrown.code !== 'inactive' ? 'refused' : 'not-checked')
			);
		} catch (err) {
			if (isDatabaseDown(err)) return message(form, DATABASE_DOWN_MESSAGE, { status: 503 });
			throw err;
		}
		if (attempt.throttled) {
			return message(form, retryMessage(attempt.retryAfterSeconds), { status: 429 });
		}
		const thrown = attempt.value;
		if (thrown !== undefined) {
			if (isRedirect(thrown)) {
				const target = new URL(thrown.location, event.url);
				redirect(303, safeRedirectPath(target.pathname + target.search));
			}
			// The account cannot be checked while the database is down: say so calmly, not a 500.
			if (isDatabaseDown(thrown)) return message(form, DATABASE_DOWN_MESSAGE, { status: 503 });
			if (!isCredentialsSignin(thrown)) throw thrown;
			const inactive = thrown.code === 'inactive';
			return message(form, inactive ? INACTIVE : NOT_RECOGNISED, { status: inactive ? 403 : 401 });
		}
		return message(form, NOT_RECOGNISED, { status: 401 });
	}
};

function isCredentialsSignin(thrown: unknown): thrown is CredentialsSignin {
	return (thrown as { type?: string } | null)?.type === 'CredentialsSignin';
}

import { fail, isRedirect, redirect } from '@sveltejs/kit';
import { signIn } from '../../../../../auth';
import { peekSignInLink } from '$lib/server/auth/sign-in-links';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ params }) => {
	const link = await peekSignInLink(params.token);
	return { email: link?.email ?? null };
};

export const actions: Actions = {
	default: async (event) => {
		const link = await peekSignInLink(event.params.token);
		if (!link) return fail(410, { expired: true });
		const headers = new Headers(event.request.headers);
		headers.delete('content-type');
		const body = new FormData();
		body.set('providerId', 'link');
		body.set('token', event.params.token);
		body.set('redirectTo', link.redirectTo);
		try {
			await signIn({ ...event, request: new Request(event.request.url, { method: 'POST', headers, body }) });
		} catch (thrown) {
			if (isRedirect(thrown)) redirect(303, link.redirectTo);
			return fail(410, { expired: true });
		}
		redirect(303, link.redirectTo);
	}
};

import { fail } from '@sveltejs/kit';
import { linkRequestSchema } from '$lib/schemas/access';
import { safeRedirectPath } from '$lib/safe-redirect';
import { requestPasswordReset, requestSignInLink } from '$lib/server/services/access';
import { DomainError } from '$lib/server/services/errors';
import type { Actions, PageServerLoad, RequestEvent } from './$types';

/** Open to everyone: this is how a signed-out person gets back in. */
export const load: PageServerLoad = async ({ url }) => ({
	email: url.searchParams.get('email') ?? '',
	redirectTo: safeRedirectPath(url.searchParams.get('redirectTo'))
});

async function ask(event: RequestEvent, kind: 'link' | 'reset') {
	const raw = Object.fromEntries(await event.request.formData());
	const parsed = linkRequestSchema.safeParse({ email: raw.email, redirectTo: raw.redirectTo || undefined });
	if (!parsed.success) return fail(400, { kind, email: String(raw.email ?? ''), problem: parsed.error.issues[0].message });
	const { email, redirectTo } = parsed.data;
	try {
		if (kind === 'link') await requestSignInLink(email, redirectTo, event.getClientAddress());
		else await requestPasswordReset(email, event.getClientAddress());
	} catch (err) {
		if (err instanceof DomainError) return fail(err.status, { kind, email, problem: err.message });
		throw err;
	}
	return { kind, email, asked: true };
}

export const actions: Actions = {
	link: (event) => ask(event, 'link'),
	reset: (event) => ask(event, 'reset')
};

import { fail } from '@sveltejs/kit';
import { newPasswordSchema } from '$lib/schemas/access';
import { completePasswordReset, peekPasswordReset } from '$lib/server/auth/password-resets';
import type { Actions, PageServerLoad } from './$types';

/** The one-time link is its own authentication; opening it uses nothing up, choosing a password does. */
export const load: PageServerLoad = async ({ params }) => ({ email: (await peekPasswordReset(params.token))?.email ?? null });

export const actions: Actions = {
	default: async (event) => {
		const raw = Object.fromEntries(await event.request.formData());
		const parsed = newPasswordSchema.safeParse({ password: raw.password, confirm: raw.confirm });
		if (!parsed.success) return fail(400, { problem: parsed.error.issues[0].message });
		const done = await completePasswordReset(event.params.token, parsed.data.password);
		if (!done) return fail(410, { expired: true });
		return { done: done.email };
	}
};

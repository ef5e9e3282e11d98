import { fail } from '@sveltejs/kit';
import { ownPasswordSchema } from '$lib/schemas/access';
import { requireUser } from '$lib/server/auth/guards';
import { reissueSessionCookie } from '$lib/server/auth/session-cookie';
import { DomainError } from '$lib/server/services/errors';
import { hasChosenPassword, setOwnPassword } from '$lib/server/services/users';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const user = requireUser(event);
	return { hasPassword: await hasChosenPassword(user.id), needsCurrent: user.role !== 'client' };
};

export const actions: Actions = {
	password: async (event) => {
		const user = requireUser(event);
		const raw = Object.fromEntries(await event.request.formData());
		const parsed = ownPasswordSchema.safeParse({ current: raw.current ?? '', password: raw.password, confirm: raw.confirm });
		if (!parsed.success) return fail(400, { problem: parsed.error.issues[0].message });
		try {
			const sessionVersion = await setOwnPassword(user.id, parsed.data.current, parsed.data.password);
			// Other devices are signed out; this one carries on with the new version.
			await reissueSessionCookie(event.cookies, sessionVersion);
		} catch (err) {
			if (err instanceof DomainError) return fail(err.status, { problem: err.message });
			throw err;
		}
		return { saved: true };
	}
};

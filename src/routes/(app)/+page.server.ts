import { requireUser } from '$lib/server/auth/guards';
import { overviewFor } from '$lib/server/services/dashboard';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const user = requireUser(event);
	return { overview: await overviewFor(user) };
};

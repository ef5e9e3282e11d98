import { requireRole } from '$lib/server/auth/guards';
import { listProgrammes } from '$lib/server/services/programmes';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	requireRole(event, 'admin');
	return { programmes: await listProgrammes() };
};

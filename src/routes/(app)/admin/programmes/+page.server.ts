import { requireCapability } from '$lib/server/auth/guards';
import { listProgrammes } from '$lib/server/services/programmes';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	requireCapability(event, 'programmes:manage');
	return { programmes: await listProgrammes() };
};

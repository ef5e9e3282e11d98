import { requireCapability } from '$lib/server/auth/guards';
import { listSites } from '$lib/server/services/sites';
import { can } from '$lib/permissions';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const user = requireCapability(event, 'sites:read');
	return { sites: await listSites(), canEdit: can(user.role, 'sites:edit') };
};

import { redirect } from '@sveltejs/kit';
import { requireCapability } from '$lib/server/auth/guards';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	requireCapability(event, 'inventory:read');
	redirect(303, '/inventory/loudspeakers');
};

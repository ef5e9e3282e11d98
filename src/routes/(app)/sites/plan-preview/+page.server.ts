import { requireCapability } from '$lib/server/auth/guards';
import type { PageServerLoad } from './$types';

/** A preview of the site plan before the sites pages exist; everything on it is computed in the browser. */
export const load: PageServerLoad = async (event) => {
	requireCapability(event, 'sites:read');
	return {};
};

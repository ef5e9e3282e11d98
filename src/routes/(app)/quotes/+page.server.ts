import { requireCapability } from '$lib/server/auth/guards';
import { listQuotes } from '$lib/server/services/quotes';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const user = requireCapability(event, 'quotes:read');
	event.depends('app:quotes');
	return { quotes: await listQuotes(user), canCreate: user.role === 'sales' || user.role === 'admin' };
};

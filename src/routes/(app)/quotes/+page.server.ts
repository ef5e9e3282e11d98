import { requireRole } from '$lib/server/auth/guards';
import { listQuotes } from '$lib/server/services/quotes';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'admin', 'sales', 'client');
	event.depends('app:quotes');
	return { quotes: await listQuotes(user), canCreate: user.role === 'sales' || user.role === 'admin' };
};

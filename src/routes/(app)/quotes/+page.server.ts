import { requireCapability } from '$lib/server/auth/guards';
import { countQuotes, listQuotes } from '$lib/server/services/quotes';
import type { PageServerLoad } from './$types';
import { can } from '$lib/permissions';

/** The newest quotes shown at once; older ones are found by searching (measured: tests/bench). */
const SHOWN = 200;

export const load: PageServerLoad = async (event) => {
	const user = requireCapability(event, 'quotes:read');
	event.depends('app:quotes');
	const search = (event.url.searchParams.get('q') ?? '').slice(0, 100);
	const [quotes, total] = await Promise.all([listQuotes(user, { search, limit: SHOWN }), countQuotes(user, search)]);
	return { quotes, total, search, canCreate: can(user.role, 'quotes:write') };
};

import { requireCapability } from '$lib/server/auth/guards';
import { listBookings } from '$lib/server/services/pick-lists';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	requireCapability(event, 'bookings:read');
	const today = new Date().toISOString().slice(0, 10);
	return { bookings: await listBookings(today) };
};

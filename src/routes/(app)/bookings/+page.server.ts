import { requireCapability } from '$lib/server/auth/guards';
import { lateUnits } from '$lib/server/services/booking-life';
import { listBookings } from '$lib/server/services/pick-lists';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	requireCapability(event, 'bookings:read');
	const today = new Date().toISOString().slice(0, 10);
	const [bookings, late] = await Promise.all([listBookings(today), lateUnits(today)]);
	return { bookings, late, today };
};

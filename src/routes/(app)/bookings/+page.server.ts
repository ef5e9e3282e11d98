import { requireCapability } from '$lib/server/auth/guards';
import { lateUnits } from '$lib/server/services/booking-life';
import { countBookings, listBookings } from '$lib/server/services/pick-lists';
import type { PageServerLoad } from './$types';

/** The next hires shown at once: enough for weeks of a busy warehouse (measured: tests/bench). */
const SHOWN = 200;

export const load: PageServerLoad = async (event) => {
	requireCapability(event, 'bookings:read');
	const today = new Date().toISOString().slice(0, 10);
	const [bookings, total, late] = await Promise.all([
		listBookings(today, { limit: SHOWN }),
		countBookings(today),
		lateUnits(today)
	]);
	return { bookings, total, late, today };
};

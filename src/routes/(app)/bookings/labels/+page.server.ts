import { requireCapability } from '$lib/server/auth/guards';
import { calendarModels } from '$lib/server/services/availability-calendar';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	requireCapability(event, 'bookings:read');
	return { models: await calendarModels() };
};

import { requireCapability } from '$lib/server/auth/guards';
import { deliveryNote } from '$lib/server/services/booking-life';
import { orHttpError } from '$lib/server/http/errors';
import { getSettings } from '$lib/server/services/settings';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	requireCapability(event, 'bookings:read');
	const [note, settings] = await Promise.all([orHttpError(() => deliveryNote(Number(event.params.id))), getSettings()]);
	return { ...note, companyName: settings.companyName };
};

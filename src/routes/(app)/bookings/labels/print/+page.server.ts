import { error } from '@sveltejs/kit';
import { z } from 'zod';
import type { ModelKey } from '$lib/quotes/availability';
import { modelKeyField } from '$lib/schemas/bookings';
import { requireCapability } from '$lib/server/auth/guards';
import { orHttpError } from '$lib/server/http/errors';
import { labelsForBooking, labelsForModel } from '$lib/server/services/unit-labels';
import type { PageServerLoad } from './$types';

const query = z.union([z.object({ booking: z.coerce.number().int().positive() }), z.object({ model: modelKeyField })]);

/** ?model=loudspeaker:12 or ?booking=34 */
export const load: PageServerLoad = async (event) => {
	requireCapability(event, 'bookings:read');
	const parsed = query.safeParse(Object.fromEntries(event.url.searchParams));
	if (!parsed.success) error(400, { message: 'Name a model (model=loudspeaker:12) or a booking (booking=34).' });
	const q = parsed.data;
	return orHttpError(() => ('booking' in q ? labelsForBooking(q.booking) : labelsForModel(q.model as ModelKey)));
};

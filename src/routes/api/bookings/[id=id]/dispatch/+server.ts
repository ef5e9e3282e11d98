import { json } from '@sveltejs/kit';
import { scanSchema } from '$lib/schemas/bookings';
import { requireCapability } from '$lib/server/auth/guards';
import { parseJsonBody } from '$lib/server/http/parse';
import { dispatchUnit } from '$lib/server/services/booking-scans';
import { orHttpError } from '$lib/server/http/errors';
import type { RequestHandler } from './$types';

/** One scanned label going out: { serial }. 409 with the reason when the unit may not go. */
export const POST: RequestHandler = async (event) => {
	const user = requireCapability(event, 'bookings:handle');
	const { serial } = await parseJsonBody(event.request, scanSchema);
	const today = new Date().toISOString().slice(0, 10);
	return json(await orHttpError(() => dispatchUnit(Number(event.params.id), serial, user, today)));
};

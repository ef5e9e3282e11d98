import { json } from '@sveltejs/kit';
import { scanSchema } from '$lib/schemas/bookings';
import { requireCapability } from '$lib/server/auth/guards';
import { parseJsonBody } from '$lib/server/http/parse';
import { returnUnit } from '$lib/server/services/booking-scans';
import { orHttpError } from '$lib/server/http/errors';
import type { RequestHandler } from './$types';

/** One scanned label coming back: { serial }. */
export const POST: RequestHandler = async (event) => {
	const user = requireCapability(event, 'bookings:handle');
	const { serial } = await parseJsonBody(event.request, scanSchema);
	return json(await orHttpError(() => returnUnit(Number(event.params.id), serial, user)));
};

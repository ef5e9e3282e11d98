import { json } from '@sveltejs/kit';
import type { ModelKey } from '$lib/quotes/availability';
import { availabilityQuerySchema } from '$lib/schemas/bookings';
import { requireCapability } from '$lib/server/auth/guards';
import { parseQuery } from '$lib/server/http/parse';
import { calendarModels, modelCalendar } from '$lib/server/services/availability-calendar';
import { orHttpError } from '$lib/server/http/errors';
import type { RequestHandler } from './$types';

/** ?from&to (yyyy-mm-dd, at most 53 weeks) and optionally model=loudspeaker:12: week-by-week stock per model. */
export const GET: RequestHandler = async (event) => {
	requireCapability(event, 'bookings:read');
	const { from, to, model } = parseQuery(event.url, availabilityQuerySchema);
	const today = new Date().toISOString().slice(0, 10);
	const keys: ModelKey[] = model ? [model as ModelKey] : (await calendarModels()).map((m) => m.key);
	return json(await orHttpError(() => Promise.all(keys.map((k) => modelCalendar(k, from, to, today)))));
};

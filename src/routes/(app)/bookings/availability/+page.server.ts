import { error } from '@sveltejs/kit';
import { z } from 'zod';
import { addDays } from '$lib/bookings/safety-tests';
import type { ModelKey } from '$lib/quotes/availability';
import { modelKeyField } from '$lib/schemas/bookings';
import { requireCapability } from '$lib/server/auth/guards';
import { calendarModels, modelCalendar } from '$lib/server/services/availability-calendar';
import { orHttpError } from '$lib/server/http/errors';
import type { PageServerLoad } from './$types';

const WEEKS = 12;
const query = z.object({ model: modelKeyField.optional(), from: z.iso.date().optional() });

export const load: PageServerLoad = async (event) => {
	requireCapability(event, 'bookings:read');
	const parsed = query.safeParse(Object.fromEntries(event.url.searchParams));
	if (!parsed.success) error(400, { message: 'Choose a model from the list and a date like 2026-03-14.' });
	const today = new Date().toISOString().slice(0, 10);
	const models = await calendarModels();
	const model = (parsed.data.model ?? models[0]?.key) as ModelKey | undefined;
	const from = parsed.data.from ?? today;
	const calendar = model ? await orHttpError(() => modelCalendar(model, from, addDays(from, WEEKS * 7 - 1), today)) : null;
	return { models, model: model ?? null, from, calendar, earlier: addDays(from, -WEEKS * 7), later: addDays(from, WEEKS * 7) };
};

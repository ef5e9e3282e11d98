import { superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { requireCapability } from '$lib/server/auth/guards';
import { quoteBodyFromForm, quoteCreateSchema, quoteRequestFormSchema } from '$lib/schemas/quotes';
import { quoteRequestFormOptions, saveFromForm } from '$lib/server/http/quote-form';
import { createQuote } from '$lib/server/services/quotes';
import type { Actions, PageServerLoad } from './$types';

/** The next Saturday, a sensible first guess for an event date. */
function nextSaturday(): string {
	const d = new Date();
	d.setUTCDate(d.getUTCDate() + ((6 - d.getUTCDay() + 7) % 7 || 7));
	return d.toISOString().slice(0, 10);
}

export const load: PageServerLoad = async (event) => {
	requireCapability(event, 'quotes:write');
	const options = await quoteRequestFormOptions();
	const date = nextSaturday();
	const clientId = Number(event.url.searchParams.get('client')) || null;
	const form = await superValidate(
		{ startDate: date, endDate: date, distanceUnit: options.distanceUnit, clientId },
		zod4(quoteRequestFormSchema),
		{ errors: false }
	);
	return { form, ...options };
};

export const actions: Actions = {
	save: async (event) => {
		const user = requireCapability(event, 'quotes:write');
		return saveFromForm(event.request, quoteCreateSchema, quoteBodyFromForm, (input) => createQuote(input, user));
	}
};

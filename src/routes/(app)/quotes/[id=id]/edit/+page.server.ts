import { error } from '@sveltejs/kit';
import { superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { isEditable } from '$lib/quotes/states';
import { requireCapability } from '$lib/server/auth/guards';
import { evaluationBodyFromForm, formFromRequest, quoteBodyFromForm, quoteReviseSchema, quoteRequestFormSchema } from '$lib/schemas/quotes';
import { orHttpError } from '$lib/server/http/errors';
import { quoteRequestFormOptions, saveFromForm } from '$lib/server/http/quote-form';
import { getQuote, reviseQuote } from '$lib/server/services/quotes';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const user = requireCapability(event, 'quotes:write');
	const quote = await orHttpError(() => getQuote(Number(event.params.id), user));
	if (!isEditable(quote.status)) error(409, { message: `A quote that is ${quote.status} can no longer be edited.` });
	const values = {
		...formFromRequest(quote.request),
		clientId: quote.clientId,
		eventName: quote.eventName,
		notes: quote.notes ?? '',
		packageId: quote.system ? null : quote.result.packageId,
		system: quote.system ? JSON.stringify(quote.system) : ''
	};
	const form = await superValidate(values, zod4(quoteRequestFormSchema), { errors: false });
	return { form, quote: { id: quote.id, reference: quote.reference, clientName: quote.clientName }, ...(await quoteRequestFormOptions()) };
};

export const actions: Actions = {
	save: async (event) => {
		const user = requireCapability(event, 'quotes:write');
		const id = Number(event.params.id);
		// The same body as a new quote's, without the client (a revision keeps it).
		const toBody = (f: Parameters<typeof evaluationBodyFromForm>[0]) => {
			const { clientId: _c, newClient: _n, ...body } = quoteBodyFromForm(f);
			return body;
		};
		return saveFromForm(event.request, quoteReviseSchema, toBody, (input) => reviseQuote(id, input, user));
	}
};

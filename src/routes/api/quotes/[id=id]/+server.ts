import { json } from '@sveltejs/kit';
import { requireCapability } from '$lib/server/auth/guards';
import { parseJsonBody } from '$lib/server/http/parse';
import { quoteReviseSchema } from '$lib/schemas/quotes';
import { orHttpError } from '$lib/server/http/errors';
import { getQuote, reviseQuote } from '$lib/server/services/quotes';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async (event) => {
	const user = requireCapability(event, 'quotes:read');
	return json(await orHttpError(() => getQuote(Number(event.params.id), user)));
};

/** A revision: a new version with the edited request (draft or sent quotes only, else 409). */
export const PATCH: RequestHandler = async (event) => {
	const user = requireCapability(event, 'quotes:write');
	const input = await parseJsonBody(event.request, quoteReviseSchema);
	return json(await orHttpError(() => reviseQuote(Number(event.params.id), input, user)));
};

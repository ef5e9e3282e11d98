import { json } from '@sveltejs/kit';
import { requireCapability } from '$lib/server/auth/guards';
import { parseJsonBody } from '$lib/server/http/parse';
import { quoteActionSchema } from '$lib/schemas/quotes';
import { orHttpError } from '$lib/server/http/errors';
import { applyQuoteAction } from '$lib/server/services/quote-actions';
import type { RequestHandler } from './$types';

/**
 * { action: send | accept | decline | request-change | cancel | close, acceptTerms?, message? };
 * a client accepting sends acceptTerms: true. An illegal move for the quote's state is 409.
 */
export const POST: RequestHandler = async (event) => {
	const user = requireCapability(event, 'quotes:act');
	const input = await parseJsonBody(event.request, quoteActionSchema);
	return json(await orHttpError(() => applyQuoteAction(Number(event.params.id), input, user)));
};

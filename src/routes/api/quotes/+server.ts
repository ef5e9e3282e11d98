import { json } from '@sveltejs/kit';
import { requireCapability } from '$lib/server/auth/guards';
import { parseJsonBody } from '$lib/server/http/parse';
import { quoteCreateSchema } from '$lib/schemas/quotes';
import { orHttpError } from '$lib/server/http/errors';
import { createQuote, listQuotes } from '$lib/server/services/quotes';
import type { RequestHandler } from './$types';

/** Staff see every quote; a client sees their own organisation's. */
export const GET: RequestHandler = async (event) => {
	const user = requireCapability(event, 'quotes:read');
	return json(await listQuotes(user));
};

export const POST: RequestHandler = async (event) => {
	const user = requireCapability(event, 'quotes:write');
	const input = await parseJsonBody(event.request, quoteCreateSchema);
	return json(await orHttpError(() => createQuote(input, user)), { status: 201 });
};

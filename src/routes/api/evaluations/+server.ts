import { json } from '@sveltejs/kit';
import { requireCapability } from '$lib/server/auth/guards';
import { parseJsonBody } from '$lib/server/http/parse';
import { quoteRequestSchema } from '$lib/schemas/evaluation';
import { orHttpError } from '$lib/server/http/errors';
import { evaluateForDesk } from '$lib/server/services/evaluations';
import type { RequestHandler } from './$types';

/** Ranks every package against a request. −Infinity (a band no cabinet covers) travels as null. */
export const POST: RequestHandler = async (event) => {
	requireCapability(event, 'evaluations:run');
	const input = await parseJsonBody(event.request, quoteRequestSchema);
	return json(await orHttpError(() => evaluateForDesk(input)));
};

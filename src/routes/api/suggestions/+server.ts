import { json } from '@sveltejs/kit';
import { requireCapability } from '$lib/server/auth/guards';
import { parseJsonBody } from '$lib/server/http';
import { evaluationRequestSchema } from '$lib/schemas/evaluation';
import { orHttpError } from '$lib/server/services/errors';
import { suggestForDesk } from '$lib/server/services/suggestions';
import type { RequestHandler } from './$types';

/** Up to five cheapest clear systems in stock for a request (the body of POST /api/evaluations). */
export const POST: RequestHandler = async (event) => {
	requireCapability(event, 'evaluations:run');
	const input = await parseJsonBody(event.request, evaluationRequestSchema);
	return json(await orHttpError(() => suggestForDesk(input)));
};

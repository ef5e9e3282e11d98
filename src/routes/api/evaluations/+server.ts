import { json } from '@sveltejs/kit';
import { requireCapability } from '$lib/server/auth/guards';
import { parseJsonBody } from '$lib/server/http/parse';
import { quoteRequestWithSystemSchema } from '$lib/schemas/systems';
import { orHttpError } from '$lib/server/http/errors';
import { evaluateForDesk } from '$lib/server/services/evaluations';
import { loadSystem } from '$lib/server/services/systems';
import type { RequestHandler } from './$types';

/**
 * Ranks every package against a request; with an inline `system` (the composer), evaluates and
 * prices that system alone. −Infinity (a band no cabinet covers) travels as null.
 */
export const POST: RequestHandler = async (event) => {
	requireCapability(event, 'evaluations:run');
	const { system, ...input } = await parseJsonBody(event.request, quoteRequestWithSystemSchema);
	return json(await orHttpError(async () => evaluateForDesk(input, system ? { packages: [await loadSystem(system)] } : {})));
};

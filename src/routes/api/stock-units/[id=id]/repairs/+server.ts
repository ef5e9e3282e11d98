import { json } from '@sveltejs/kit';
import { repairSchema } from '$lib/schemas/bookings';
import { requireCapability } from '$lib/server/auth/guards';
import { parseJsonBody } from '$lib/server/http/parse';
import { listRepairs, recordRepair } from '$lib/server/services/damage-repairs';
import { orHttpError } from '$lib/server/http/errors';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async (event) => {
	requireCapability(event, 'bookings:read');
	return json(await orHttpError(() => listRepairs(Number(event.params.id))));
};

/** { description, costMinor, done }: a repair marked done puts a unit in repair back to ready. */
export const POST: RequestHandler = async (event) => {
	const user = requireCapability(event, 'bookings:handle');
	const input = await parseJsonBody(event.request, repairSchema);
	return json(await orHttpError(() => recordRepair(Number(event.params.id), input, user)), { status: 201 });
};

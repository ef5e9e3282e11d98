import { json } from '@sveltejs/kit';
import { requireCapability } from '$lib/server/auth/guards';
import { parseJsonBody } from '$lib/server/http/parse';
import { userUpdateSchema } from '$lib/schemas/users';
import { orHttpError } from '$lib/server/http/errors';
import { updateUser } from '$lib/server/services/users';
import type { RequestHandler } from './$types';

export const PATCH: RequestHandler = async (event) => {
	const actor = requireCapability(event, 'users:manage');
	const changes = await parseJsonBody(event.request, userUpdateSchema);
	const user = await orHttpError(() => updateUser(actor.id, Number(event.params.id), changes));
	return json(user);
};

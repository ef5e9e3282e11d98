import { json } from '@sveltejs/kit';
import { requireCapability } from '$lib/server/auth/guards';
import { parseJsonBody } from '$lib/server/http/parse';
import { userCreateSchema } from '$lib/schemas/users';
import { orHttpError } from '$lib/server/http/errors';
import { createUser, listUsers } from '$lib/server/services/users';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async (event) => {
	requireCapability(event, 'users:manage');
	return json(await listUsers());
};

export const POST: RequestHandler = async (event) => {
	requireCapability(event, 'users:manage');
	const input = await parseJsonBody(event.request, userCreateSchema);
	const created = await orHttpError(() => createUser(input));
	return json(created, { status: 201 });
};

import { json } from '@sveltejs/kit';
import { requireRole } from '$lib/server/auth/guards';
import { parseJsonBody } from '$lib/server/http';
import { userCreateSchema } from '$lib/schemas/users';
import { orHttpError } from '$lib/server/services/errors';
import { createUser, listUsers } from '$lib/server/services/users';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async (event) => {
	requireRole(event, 'admin');
	return json(await listUsers());
};

export const POST: RequestHandler = async (event) => {
	requireRole(event, 'admin');
	const input = await parseJsonBody(event.request, userCreateSchema);
	const created = await orHttpError(() => createUser(input));
	return json(created, { status: 201 });
};

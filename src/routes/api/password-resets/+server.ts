import { json } from '@sveltejs/kit';
import { parseJsonBody } from '$lib/server/http/parse';
import { linkRequestSchema } from '$lib/schemas/access';
import { requestPasswordReset } from '$lib/server/services/access';
import { orHttpError } from '$lib/server/http/errors';
import type { RequestHandler } from './$types';

/** { email } → 202 whatever the address; an active account gets a one-time reset link. Open to everyone. */
export const POST: RequestHandler = async (event) => {
	const { email } = await parseJsonBody(event.request, linkRequestSchema);
	await orHttpError(() => requestPasswordReset(email, event.getClientAddress()));
	return json({ message: 'If that address has an account, a link to choose a new password is on its way.' }, { status: 202 });
};

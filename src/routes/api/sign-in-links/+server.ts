import { json } from '@sveltejs/kit';
import { parseJsonBody } from '$lib/server/http/parse';
import { linkRequestSchema } from '$lib/schemas/access';
import { requestSignInLink } from '$lib/server/services/access';
import { orHttpError } from '$lib/server/http/errors';
import type { RequestHandler } from './$types';

/**
 * { email, redirectTo? } → 202 whatever the address (a link goes out only to an active client
 * account). Open to everyone: asking for a link is how a signed-out client gets back in.
 */
export const POST: RequestHandler = async (event) => {
	const { email, redirectTo } = await parseJsonBody(event.request, linkRequestSchema);
	await orHttpError(() => requestSignInLink(email, redirectTo, event.getClientAddress()));
	return json({ message: 'If that address has a client account, a sign-in link is on its way.' }, { status: 202 });
};

import { error } from '@sveltejs/kit';
import { requireCapability } from '$lib/server/auth/guards';
import { readLogo } from '$lib/server/services/company-logo';
import type { RequestHandler } from './$types';

/** The letterhead logo for the print view (anyone who may read a quote sees the letterhead). */
export const GET: RequestHandler = async (event) => {
	requireCapability(event, 'quotes:read');
	const logo = await readLogo();
	if (!logo) error(404, { message: 'No logo has been uploaded.' });
	return new Response(new Uint8Array(logo.bytes), {
		headers: { 'content-type': logo.type, 'cache-control': 'private, max-age=60', 'x-content-type-options': 'nosniff' }
	});
};

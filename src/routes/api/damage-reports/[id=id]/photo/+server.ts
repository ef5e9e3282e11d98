import { requireCapability } from '$lib/server/auth/guards';
import { damagePhoto } from '$lib/server/services/damage-repairs';
import { orHttpError } from '$lib/server/http/errors';
import type { RequestHandler } from './$types';

/** The damage photo, served only to staff; never inline HTML, never sniffed by the browser. */
export const GET: RequestHandler = async (event) => {
	requireCapability(event, 'bookings:read');
	const { bytes, mimeType } = await orHttpError(() => damagePhoto(Number(event.params.id)));
	return new Response(new Uint8Array(bytes), {
		headers: { 'content-type': mimeType, 'x-content-type-options': 'nosniff', 'cache-control': 'private, no-store' }
	});
};

import { requireCapability } from '$lib/server/auth/guards';
import { orHttpError } from '$lib/server/http/errors';
import { quotePdf } from '$lib/server/services/quote-document';
import type { RequestHandler } from './$types';

/** The quote document as a PDF: staff, and the owning client (another client's quote is 404). */
export const GET: RequestHandler = async (event) => {
	const user = requireCapability(event, 'quotes:read');
	const { bytes, filename } = await orHttpError(() => quotePdf(Number(event.params.id), user));
	return new Response(new Uint8Array(bytes), {
		headers: {
			'content-type': 'application/pdf',
			'content-disposition': `inline; filename="${filename}"`,
			'cache-control': 'private, no-store'
		}
	});
};

import { requireCapability } from '$lib/server/auth/guards';
import { orHttpError } from '$lib/server/http/errors';
import { documentContentFor } from '$lib/server/services/quote-document';
import { getSettings } from '$lib/server/services/settings';
import type { PageServerLoad } from './$types';

/** The print view: the same document content as the PDF, without the app around it. */
export const load: PageServerLoad = async (event) => {
	const user = requireCapability(event, 'quotes:read');
	const id = Number(event.params.id);
	const [doc, settings] = await Promise.all([orHttpError(() => documentContentFor(id, user)), getSettings()]);
	return { doc, id, hasLogo: settings.logoFile !== null };
};

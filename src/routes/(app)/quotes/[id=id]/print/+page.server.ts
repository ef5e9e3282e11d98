import { requireCapability } from '$lib/server/auth/guards';
import { orHttpError } from '$lib/server/services/errors';
import { getQuote } from '$lib/server/services/quotes';
import { getSettings } from '$lib/server/services/settings';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const user = requireCapability(event, 'quotes:read');
	const [quote, settings] = await Promise.all([
		orHttpError(() => getQuote(Number(event.params.id), user)),
		getSettings()
	]);
	return { quote, companyName: settings.companyName };
};

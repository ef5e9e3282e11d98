import { fail } from '@sveltejs/kit';
import { requireCapability } from '$lib/server/auth/guards';
import { removeLogo, saveLogo } from '$lib/server/services/company-logo';
import { DomainError } from '$lib/server/services/errors';
import { getSettings } from '$lib/server/services/settings';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	requireCapability(event, 'settings:manage');
	return { hasLogo: (await getSettings()).logoFile !== null };
};

export const actions: Actions = {
	upload: async (event) => {
		requireCapability(event, 'settings:manage');
		const file = (await event.request.formData().catch(() => null))?.get('logo');
		if (!(file instanceof File) || file.size === 0) return fail(422, { logoError: 'Choose a PNG or JPEG file.' });
		try {
			await saveLogo(new Uint8Array(await file.arrayBuffer()));
		} catch (err) {
			if (err instanceof DomainError) return fail(err.status, { logoError: err.message });
			throw err;
		}
		return { logoSaved: true };
	},
	remove: async (event) => {
		requireCapability(event, 'settings:manage');
		try {
			await removeLogo();
		} catch (err) {
			if (err instanceof DomainError) return fail(err.status, { logoError: err.message });
			throw err;
		}
		return { logoRemoved: true };
	}
};

import { fail, redirect } from '@sveltejs/kit';
import { superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { requireCapability } from '$lib/server/auth/guards';
import { siteSchema } from '$lib/schemas/sites';
import { siteCheckOptions } from '$lib/server/services/site-check';
import { createSite } from '$lib/server/services/sites';
import { getSettings } from '$lib/server/services/settings';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	requireCapability(event, 'sites:edit');
	const [settings, check] = await Promise.all([getSettings(), siteCheckOptions()]);
	const form = await superValidate({ units: settings.distanceUnit }, zod4(siteSchema), { errors: false });
	return { form, check };
};

export const actions: Actions = {
	default: async (event) => {
		requireCapability(event, 'sites:edit');
		const form = await superValidate(event.request, zod4(siteSchema));
		if (!form.valid) return fail(400, { form });
		const site = await createSite(form.data);
		redirect(303, `/sites/${site.id}`);
	}
};

import { error, fail, redirect } from '@sveltejs/kit';
import { message, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { requireCapability } from '$lib/server/auth/guards';
import { can } from '$lib/permissions';
import { siteSchema } from '$lib/schemas/sites';
import { DomainError } from '$lib/server/services/errors';
import { siteCheckOptions } from '$lib/server/services/site-check';
import { deleteSite, findSite, updateSite } from '$lib/server/services/sites';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const user = requireCapability(event, 'sites:read');
	const [site, check] = await Promise.all([findSite(Number(event.params.id)), siteCheckOptions()]);
	if (!site) error(404, { message: 'No such site.' });
	const { id, updatedAt, ...fields } = site;
	return { id, updatedAt, form: await superValidate(fields, zod4(siteSchema)), check, canEdit: can(user.role, 'sites:edit') };
};

export const actions: Actions = {
	save: async (event) => {
		requireCapability(event, 'sites:edit');
		const form = await superValidate(event.request, zod4(siteSchema));
		if (!form.valid) return fail(400, { form });
		try {
			await updateSite(Number(event.params.id), form.data);
		} catch (err) {
			if (err instanceof DomainError && err.status === 404) error(404, { message: err.message });
			throw err;
		}
		return message(form, 'Site saved. Quotes already made keep the site as it was.');
	},
	delete: async (event) => {
		requireCapability(event, 'sites:edit');
		try {
			await deleteSite(Number(event.params.id));
		} catch (err) {
			if (err instanceof DomainError) error(err.status, { message: err.message });
			throw err;
		}
		redirect(303, '/sites');
	}
};

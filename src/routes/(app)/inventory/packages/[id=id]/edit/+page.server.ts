import { fail, redirect } from '@sveltejs/kit';
import { superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { INVENTORY_EDITORS } from '$lib/inventory/roles';
import { packageSchema } from '$lib/schemas/inventory-packages';
import { requireRole } from '$lib/server/auth/guards';
import { packageFormOptions, refusal } from '$lib/server/inventory-pages';
import { orHttpError } from '$lib/server/services/errors';
import { getPackage, updatePackage } from '$lib/server/services/inventory-packages';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	requireRole(event, ...INVENTORY_EDITORS);
	const pkg = await orHttpError(() => getPackage(Number(event.params.id)));
	return { pkg, form: await superValidate(pkg, zod4(packageSchema)), ...(await packageFormOptions()) };
};

export const actions: Actions = {
	default: async (event) => {
		const actor = requireRole(event, ...INVENTORY_EDITORS);
		const id = Number(event.params.id);
		const form = await superValidate(event.request, zod4(packageSchema));
		if (!form.valid) return fail(400, { form });
		try {
			await updatePackage(id, form.data, actor.id);
		} catch (err) {
			return refusal(form, err);
		}
		redirect(303, `/inventory/packages/${id}`);
	}
};

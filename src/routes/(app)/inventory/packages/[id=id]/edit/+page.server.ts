import { fail, redirect } from '@sveltejs/kit';
import { superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { packageSchema } from '$lib/schemas/inventory-packages';
import { requireCapability } from '$lib/server/auth/guards';
import { packageFormOptions, refusal } from '$lib/server/http/inventory-pages';
import { orHttpError } from '$lib/server/http/errors';
import { getPackage, updatePackage } from '$lib/server/services/inventory-packages';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	requireCapability(event, 'inventory:edit');
	const pkg = await orHttpError(() => getPackage(Number(event.params.id)));
	return { pkg, form: await superValidate(pkg, zod4(packageSchema)), ...(await packageFormOptions()) };
};

export const actions: Actions = {
	default: async (event) => {
		const actor = requireCapability(event, 'inventory:edit');
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

import { fail, redirect } from '@sveltejs/kit';
import { superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { amplifierSchema } from '$lib/schemas/inventory-amplifiers';
import { requireCapability } from '$lib/server/auth/guards';
import { refusal } from '$lib/server/http/inventory-pages';
import { orHttpError } from '$lib/server/http/errors';
import { amplifiers } from '$lib/server/services/inventory-amplifiers';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	requireCapability(event, 'inventory:edit');
	const model = await orHttpError(() => amplifiers.get(Number(event.params.id)));
	return { model, form: await superValidate(model, zod4(amplifierSchema)) };
};

export const actions: Actions = {
	default: async (event) => {
		const actor = requireCapability(event, 'inventory:edit');
		const id = Number(event.params.id);
		const form = await superValidate(event.request, zod4(amplifierSchema));
		if (!form.valid) return fail(400, { form });
		try {
			await amplifiers.update(id, form.data, actor.id);
		} catch (err) {
			return refusal(form, err);
		}
		redirect(303, `/inventory/amplifiers/${id}`);
	}
};

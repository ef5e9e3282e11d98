import { fail, redirect } from '@sveltejs/kit';
import { superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { amplifierSchema } from '$lib/schemas/inventory-amplifiers';
import { requireCapability } from '$lib/server/auth/guards';
import { refusal } from '$lib/server/http/inventory-pages';
import { amplifiers } from '$lib/server/services/inventory-amplifiers';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	requireCapability(event, 'inventory:edit');
	const form = await superValidate({ channels: 2, rackUnits: 2 }, zod4(amplifierSchema), { errors: false });
	return { form };
};

export const actions: Actions = {
	default: async (event) => {
		const actor = requireCapability(event, 'inventory:edit');
		const form = await superValidate(event.request, zod4(amplifierSchema));
		if (!form.valid) return fail(400, { form });
		let id: number;
		try {
			id = (await amplifiers.create(form.data, actor.id)).id;
		} catch (err) {
			return refusal(form, err);
		}
		redirect(303, `/inventory/amplifiers/${id}`);
	}
};

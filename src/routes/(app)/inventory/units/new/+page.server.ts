import { fail, redirect } from '@sveltejs/kit';
import { superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { stockUnitSchema } from '$lib/schemas/inventory-units';
import { requireCapability } from '$lib/server/auth/guards';
import { refusal, unitFormOptions } from '$lib/server/http/inventory-pages';
import { createStockUnit } from '$lib/server/services/inventory-units';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	requireCapability(event, 'inventory:edit');
	const form = await superValidate({ modelType: 'loudspeaker', modelId: 0, status: 'ready' }, zod4(stockUnitSchema), { errors: false });
	return { form, ...(await unitFormOptions()) };
};

export const actions: Actions = {
	default: async (event) => {
		const actor = requireCapability(event, 'inventory:edit');
		const form = await superValidate(event.request, zod4(stockUnitSchema));
		if (!form.valid) return fail(400, { form });
		let id: number;
		try {
			id = (await createStockUnit(form.data, actor.id)).id;
		} catch (err) {
			return refusal(form, err);
		}
		redirect(303, `/inventory/units/${id}`);
	}
};

import { can } from '$lib/permissions';
import { fail, redirect } from '@sveltejs/kit';
import { superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { stockUnitSchema } from '$lib/schemas/inventory-units';
import { requireCapability } from '$lib/server/auth/guards';
import { deleteOrExplain, refusal, unitFormOptions } from '$lib/server/http/inventory-pages';
import { orHttpError } from '$lib/server/http/errors';
import { listHistory } from '$lib/server/services/inventory-history';
import { deleteStockUnit, getStockUnit, updateStockUnit } from '$lib/server/services/inventory-units';
import type { Actions, PageServerLoad } from './$types';

/** One unit: its details and history for everyone on staff, the edit form for the warehouse. */
export const load: PageServerLoad = async (event) => {
	const user = requireCapability(event, 'inventory:read');
	const id = Number(event.params.id);
	const unit = await orHttpError(() => getStockUnit(id));
	const editing = can(user.role, 'inventory:edit')
		? { form: await superValidate(unit, zod4(stockUnitSchema)), ...(await unitFormOptions()) }
		: null;
	return { unit, history: await listHistory('unit', id), editing };
};

export const actions: Actions = {
	save: async (event) => {
		const actor = requireCapability(event, 'inventory:edit');
		const id = Number(event.params.id);
		const form = await superValidate(event.request, zod4(stockUnitSchema));
		if (!form.valid) return fail(400, { form });
		try {
			await updateStockUnit(id, form.data, actor.id);
		} catch (err) {
			return refusal(form, err);
		}
		redirect(303, `/inventory/units/${id}`);
	},
	delete: async (event) => {
		requireCapability(event, 'inventory:edit');
		return deleteOrExplain(() => deleteStockUnit(Number(event.params.id)), '/inventory/units');
	}
};

import { fail, redirect } from '@sveltejs/kit';
import { superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { packageSchema } from '$lib/schemas/inventory-packages';
import { requireCapability } from '$lib/server/auth/guards';
import { packageFormOptions, refusal } from '$lib/server/http/inventory-pages';
import { createPackage } from '$lib/server/services/inventory-packages';
import type { Actions, PageServerLoad } from './$types';

const emptyGroup = { loudspeakerModelId: 0, count: 1, stacks: 1, amplifierModelId: 0, cabinetsPerChannel: 1, flown: false };

export const load: PageServerLoad = async (event) => {
	requireCapability(event, 'inventory:edit');
	const form = await superValidate({ active: true, groups: [emptyGroup] }, zod4(packageSchema), { errors: false });
	return { form, ...(await packageFormOptions()) };
};

export const actions: Actions = {
	default: async (event) => {
		const actor = requireCapability(event, 'inventory:edit');
		const form = await superValidate(event.request, zod4(packageSchema));
		if (!form.valid) return fail(400, { form });
		let id: number;
		try {
			id = (await createPackage(form.data, actor.id)).id;
		} catch (err) {
			return refusal(form, err);
		}
		redirect(303, `/inventory/packages/${id}`);
	}
};

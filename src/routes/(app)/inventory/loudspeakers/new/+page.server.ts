import { fail, redirect } from '@sveltejs/kit';
import { superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { loudspeakerSchema } from '$lib/schemas/inventory-loudspeakers';
import { requireCapability } from '$lib/server/auth/guards';
import { refusal } from '$lib/server/http/inventory-pages';
import { loudspeakers } from '$lib/server/services/inventory-loudspeakers';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	requireCapability(event, 'inventory:edit');
	const form = await superValidate({ kind: 'full-range', sensitivityRef: '1W' }, zod4(loudspeakerSchema), { errors: false });
	return { form };
};

export const actions: Actions = {
	default: async (event) => {
		const actor = requireCapability(event, 'inventory:edit');
		const form = await superValidate(event.request, zod4(loudspeakerSchema));
		if (!form.valid) return fail(400, { form });
		let id: number;
		try {
			id = (await loudspeakers.create(form.data, actor.id)).id;
		} catch (err) {
			return refusal(form, err);
		}
		redirect(303, `/inventory/loudspeakers/${id}`);
	}
};

import { fail } from '@sveltejs/kit';
import { message, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { requireCapability } from '$lib/server/auth/guards';
import { settingsSchema } from '$lib/schemas/programmes';
import { getSettings, settingsForForm, updateSettings } from '$lib/server/services/settings';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	requireCapability(event, 'settings:manage');
	const form = await superValidate(settingsForForm(await getSettings()), zod4(settingsSchema));
	return { form };
};

export const actions: Actions = {
	default: async (event) => {
		requireCapability(event, 'settings:manage');
		const form = await superValidate(event.request, zod4(settingsSchema));
		if (!form.valid) return fail(400, { form });
		await updateSettings(form.data);
		return message(form, 'Settings saved. New quotes use them; sent quotes keep the terms they were sent with.');
	}
};

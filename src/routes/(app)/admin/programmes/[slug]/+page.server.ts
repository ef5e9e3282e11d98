import { error, fail, redirect } from '@sveltejs/kit';
import { setError, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { requireCapability } from '$lib/server/auth/guards';
import { programmeFormSchema, programmeFromForm, programmeToForm } from '$lib/schemas/programmes';
import { DomainError } from '$lib/server/services/errors';
import { findProgramme, saveProgramme } from '$lib/server/services/programmes';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	requireCapability(event, 'programmes:manage');
	if (event.params.slug === 'new') return { form: await superValidate(zod4(programmeFormSchema)), isNew: true };
	const programme = await findProgramme(event.params.slug);
	if (!programme) error(404, { message: 'No such programme profile.' });
	return { form: await superValidate(programmeToForm(programme), zod4(programmeFormSchema)), isNew: false };
};

export const actions: Actions = {
	default: async (event) => {
		requireCapability(event, 'programmes:manage');
		const form = await superValidate(event.request, zod4(programmeFormSchema));
		if (!form.valid) return fail(400, { form });
		const existing = event.params.slug === 'new' ? null : await findProgramme(event.params.slug);
		if (event.params.slug !== 'new' && !existing) error(404, { message: 'No such programme profile.' });
		try {
			await saveProgramme(programmeFromForm(form.data), existing?.id);
		} catch (err) {
			if (err instanceof DomainError && err.errors?.slug) return setError(form, 'slug', err.errors.slug[0], { status: 409 });
			throw err;
		}
		redirect(303, '/admin/programmes');
	}
};

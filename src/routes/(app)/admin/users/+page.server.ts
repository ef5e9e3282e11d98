import { fail } from '@sveltejs/kit';
import { message, setError, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { z } from 'zod';
import { requireCapability } from '$lib/server/auth/guards';
import { userCreateSchema, userUpdateSchema } from '$lib/schemas/users';
import { DomainError } from '$lib/server/services/errors';
import { createUser, listClientOptions, listUsers, updateUser } from '$lib/server/services/users';
import type { Actions, PageServerLoad } from './$types';

const updateFormSchema = userUpdateSchema.extend({ id: z.coerce.number().int().positive() });

export const load: PageServerLoad = async (event) => {
	requireCapability(event, 'users:manage');
	const [users, clients, form] = await Promise.all([
		listUsers(),
		listClientOptions(),
		superValidate(zod4(userCreateSchema))
	]);
	return { users, clients, form };
};

export const actions: Actions = {
	create: async (event) => {
		requireCapability(event, 'users:manage');
		const form = await superValidate(event.request, zod4(userCreateSchema));
		form.data.password = '';
		if (!form.valid) return fail(400, { form });
		try {
			const { user, generatedPassword } = await createUser(form.data);
			return message(
				form,
				generatedPassword
					? `Account created for ${user.email}. Their first password is ${generatedPassword} — pass it on privately; it is not shown again.`
					: `Account created for ${user.email}.`
			);
		} catch (err) {
			if (!(err instanceof DomainError)) throw err;
			if (err.errors?.email) return setError(form, 'email', err.errors.email[0], { status: err.status });
			return message(form, err.message, { status: err.status });
		}
	},
	update: async (event) => {
		const actor = requireCapability(event, 'users:manage');
		const raw = Object.fromEntries(await event.request.formData());
		const parsed = updateFormSchema.safeParse({
			id: raw.id,
			...(raw.role ? { role: raw.role } : {}),
			...(raw.active ? { active: raw.active === 'true' } : {})
		});
		if (!parsed.success) return fail(400, { updateError: 'That change could not be read.' });
		const { id, ...changes } = parsed.data;
		try {
			await updateUser(actor.id, id, changes);
			return { updated: id };
		} catch (err) {
			if (err instanceof DomainError) return fail(err.status, { updateError: err.message });
			throw err;
		}
	}
};

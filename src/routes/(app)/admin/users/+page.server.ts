import { fail } from '@sveltejs/kit';
import { message, setError, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { z } from 'zod';
import { requireCapability } from '$lib/server/auth/guards';
import { userCreateFormSchema, userUpdateSchema, type UserCreateInput } from '$lib/schemas/users';
import { ROLE_LABELS } from '$lib/permissions';
import { sendPasswordResetTo } from '$lib/server/services/access';
import { DomainError } from '$lib/server/services/errors';
import { createUser, listClientOptions, listUsers, updateUser } from '$lib/server/services/users';
import type { Actions, PageServerLoad } from './$types';

const updateFormSchema = userUpdateSchema.extend({ id: z.coerce.number().int().positive() });

export const load: PageServerLoad = async (event) => {
	requireCapability(event, 'users:manage');
	const [users, clients, form] = await Promise.all([
		listUsers(),
		listClientOptions(),
		superValidate(zod4(userCreateFormSchema))
	]);
	return { users, clients, form };
};

export const actions: Actions = {
	create: async (event) => {
		requireCapability(event, 'users:manage');
		const form = await superValidate(event.request, zod4(userCreateFormSchema));
		form.data.password = '';
		if (!form.valid) return fail(400, { form });
		try {
			const { user, generatedPassword } = await createUser(form.data as UserCreateInput);
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
	sendReset: async (event) => {
		requireCapability(event, 'users:manage');
		const id = Number((await event.request.formData()).get('id'));
		if (!Number.isInteger(id) || id <= 0) return fail(400, { updateError: 'That request could not be read.' });
		try {
			const { email, sent } = await sendPasswordResetTo(id);
			return { what: sent ? `A link to choose a new password went to ${email}. It works once, for an hour.` : `The reset link for ${email} is queued; the mail server did not answer and it will be retried.` };
		} catch (err) {
			if (err instanceof DomainError) return fail(err.status, { updateError: err.message });
			throw err;
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
			const user = await updateUser(actor.id, id, changes);
			const what =
				changes.active === false
					? `${user.name} is deactivated and can no longer sign in.`
					: changes.active === true
						? `${user.name} is active again and can sign in.`
						: `${user.name} is now ${ROLE_LABELS[user.role]}; it takes effect on their next page.`;
			return { updated: id, what };
		} catch (err) {
			if (err instanceof DomainError) return fail(err.status, { updateError: err.message });
			throw err;
		}
	}
};

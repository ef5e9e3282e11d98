import { fail, redirect } from '@sveltejs/kit';
import { setError, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { can } from '$lib/permissions';
import { clientSchema } from '$lib/schemas/clients';
import { requireCapability } from '$lib/server/auth/guards';
import { createClient, listClients } from '$lib/server/services/clients';
import { DomainError } from '$lib/server/services/errors';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const user = requireCapability(event, 'clients:read');
	const q = event.url.searchParams.get('q') ?? '';
	const [clients, form] = await Promise.all([listClients(q), superValidate(zod4(clientSchema), { errors: false })]);
	return { clients, q, form, canEdit: can(user.role, 'clients:edit') };
};

export const actions: Actions = {
	create: async (event) => {
		const actor = requireCapability(event, 'clients:edit');
		const form = await superValidate(event.request, zod4(clientSchema));
		if (!form.valid) return fail(400, { form });
		let id: number;
		try {
			id = (await createClient(form.data, actor)).id;
		} catch (err) {
			if (err instanceof DomainError) return setError(form, '', err.message, { status: err.status });
			throw err;
		}
		redirect(303, `/clients/${id}`);
	}
};

import { fail } from '@sveltejs/kit';
import { message, setError, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { can } from '$lib/permissions';
import { clientSchema, contactSchema, contactUpdateSchema } from '$lib/schemas/clients';
import { requireCapability } from '$lib/server/auth/guards';
import { addContact, getClient, updateClient, updateContact } from '$lib/server/services/clients';
import { DomainError } from '$lib/server/services/errors';
import { orHttpError } from '$lib/server/http/errors';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const user = requireCapability(event, 'clients:read');
	const client = await orHttpError(() => getClient(Number(event.params.id)));
	const { name, contactName, email, phone, billingAddress, taxNumber, notes } = client;
	const form = await superValidate(
		{ name, contactName, email, phone: phone ?? '', billingAddress: billingAddress ?? '', taxNumber: taxNumber ?? '', notes: notes ?? '' },
		zod4(clientSchema)
	);
	return { client, form, canEdit: can(user.role, 'clients:edit') };
};

/** Contact forms are small and flat; their refusals come back as one calm line. */
async function contactAction(event: Parameters<Actions[string]>[0], update: boolean) {
	const actor = requireCapability(event, 'clients:edit');
	const raw = Object.fromEntries(await event.request.formData());
	const parsed = contactUpdateSchema.omit(update ? {} : { contactId: true }).safeParse({ ...raw, contactId: Number(raw.contactId) });
	if (!parsed.success) return fail(400, { contactError: parsed.error.issues[0].message });
	const id = Number(event.params.id);
	const contact = contactSchema.parse(parsed.data);
	try {
		if (update) await updateContact(id, Number(raw.contactId), contact, actor);
		else await addContact(id, contact, actor);
		return { contactSaved: contact.email };
	} catch (err) {
		if (err instanceof DomainError) return fail(err.status, { contactError: err.message });
		throw err;
	}
}

export const actions: Actions = {
	save: async (event) => {
		const actor = requireCapability(event, 'clients:edit');
		const form = await superValidate(event.request, zod4(clientSchema));
		if (!form.valid) return fail(400, { form });
		try {
			await updateClient(Number(event.params.id), form.data, actor);
		} catch (err) {
			if (err instanceof DomainError) return setError(form, '', err.message, { status: err.status });
			throw err;
		}
		return message(form, 'Saved. The change is in the history below.');
	},
	addContact: (event) => contactAction(event, false),
	updateContact: (event) => contactAction(event, true)
};

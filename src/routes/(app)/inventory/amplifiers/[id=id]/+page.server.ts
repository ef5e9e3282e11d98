import { requireCapability } from '$lib/server/auth/guards';
import { deleteOrExplain, modelDetail, removeAttachmentFromForm, uploadFromForm } from '$lib/server/http/inventory-pages';
import { orHttpError } from '$lib/server/http/errors';
import { amplifiers } from '$lib/server/services/inventory-amplifiers';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	requireCapability(event, 'inventory:read');
	return orHttpError(() => modelDetail('amplifier', Number(event.params.id), amplifiers.get));
};

export const actions: Actions = {
	upload: async (event) => {
		const actor = requireCapability(event, 'inventory:edit');
		return uploadFromForm(event.request, 'amplifier', Number(event.params.id), actor.id);
	},
	removeAttachment: async (event) => {
		requireCapability(event, 'inventory:edit');
		return removeAttachmentFromForm(event.request);
	},
	delete: async (event) => {
		requireCapability(event, 'inventory:edit');
		return deleteOrExplain(() => amplifiers.remove(Number(event.params.id)), '/inventory/amplifiers');
	}
};

import { requireCapability } from '$lib/server/auth/guards';
import { deleteOrExplain, modelDetail, removeAttachmentFromForm, uploadFromForm } from '$lib/server/http/inventory-pages';
import { orHttpError } from '$lib/server/http/errors';
import { loudspeakers } from '$lib/server/services/inventory-loudspeakers';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	requireCapability(event, 'inventory:read');
	return orHttpError(() => modelDetail('loudspeaker', Number(event.params.id), loudspeakers.get));
};

export const actions: Actions = {
	upload: async (event) => {
		const actor = requireCapability(event, 'inventory:edit');
		return uploadFromForm(event.request, 'loudspeaker', Number(event.params.id), actor.id);
	},
	removeAttachment: async (event) => {
		requireCapability(event, 'inventory:edit');
		return removeAttachmentFromForm(event.request);
	},
	delete: async (event) => {
		requireCapability(event, 'inventory:edit');
		return deleteOrExplain(() => loudspeakers.remove(Number(event.params.id)), '/inventory/loudspeakers');
	}
};

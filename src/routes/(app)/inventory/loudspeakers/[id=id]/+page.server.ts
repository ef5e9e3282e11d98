import { INVENTORY_EDITORS, INVENTORY_READERS } from '$lib/inventory/roles';
import { requireRole } from '$lib/server/auth/guards';
import { deleteOrExplain, modelDetail, removeAttachmentFromForm, uploadFromForm } from '$lib/server/inventory-pages';
import { orHttpError } from '$lib/server/services/errors';
import { loudspeakers } from '$lib/server/services/inventory-loudspeakers';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	requireRole(event, ...INVENTORY_READERS);
	return orHttpError(() => modelDetail('loudspeaker', Number(event.params.id), loudspeakers.get));
};

export const actions: Actions = {
	upload: async (event) => {
		const actor = requireRole(event, ...INVENTORY_EDITORS);
		return uploadFromForm(event.request, 'loudspeaker', Number(event.params.id), actor.id);
	},
	removeAttachment: async (event) => {
		requireRole(event, ...INVENTORY_EDITORS);
		return removeAttachmentFromForm(event.request);
	},
	delete: async (event) => {
		requireRole(event, ...INVENTORY_EDITORS);
		return deleteOrExplain(() => loudspeakers.remove(Number(event.params.id)), '/inventory/loudspeakers');
	}
};

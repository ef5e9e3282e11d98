import { INVENTORY_EDITORS, INVENTORY_READERS } from '$lib/inventory/roles';
import { requireRole } from '$lib/server/auth/guards';
import { deleteOrExplain, modelDetail, removeAttachmentFromForm, uploadFromForm } from '$lib/server/inventory-pages';
import { orHttpError } from '$lib/server/services/errors';
import { amplifiers } from '$lib/server/services/inventory-amplifiers';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	requireRole(event, ...INVENTORY_READERS);
	return orHttpError(() => modelDetail('amplifier', Number(event.params.id), amplifiers.get));
};

export const actions: Actions = {
	upload: async (event) => {
		const actor = requireRole(event, ...INVENTORY_EDITORS);
		return uploadFromForm(event.request, 'amplifier', Number(event.params.id), actor.id);
	},
	removeAttachment: async (event) => {
		requireRole(event, ...INVENTORY_EDITORS);
		return removeAttachmentFromForm(event.request);
	},
	delete: async (event) => {
		requireRole(event, ...INVENTORY_EDITORS);
		return deleteOrExplain(() => amplifiers.remove(Number(event.params.id)), '/inventory/amplifiers');
	}
};

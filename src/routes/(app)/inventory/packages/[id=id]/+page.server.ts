import { packageBillOfMaterials } from '$lib/inventory/bill-of-materials';
import { channelLoadOhm } from '$lib/inventory/channel-plan';
import { requireCapability } from '$lib/server/auth/guards';
import { deleteOrExplain } from '$lib/server/http/inventory-pages';
import { orHttpError } from '$lib/server/http/errors';
import { listHistory } from '$lib/server/services/inventory-history';
import { deletePackage, getLoadedPackage } from '$lib/server/services/inventory-packages';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	requireCapability(event, 'inventory:read');
	const id = Number(event.params.id);
	const pkg = await orHttpError(() => getLoadedPackage(id));
	return {
		pkg,
		loads: pkg.groups.map((g) => Math.round(channelLoadOhm(g) * 100) / 100),
		bill: packageBillOfMaterials(pkg.groups),
		history: await listHistory('package', id)
	};
};

export const actions: Actions = {
	delete: async (event) => {
		requireCapability(event, 'inventory:edit');
		return deleteOrExplain(() => deletePackage(Number(event.params.id)), '/inventory/packages');
	}
};

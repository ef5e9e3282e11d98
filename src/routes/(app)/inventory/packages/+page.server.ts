import { packageBillOfMaterials } from '$lib/inventory/bill-of-materials';
import { can } from '$lib/permissions';
import { requireCapability } from '$lib/server/auth/guards';
import { listLoadedPackages } from '$lib/server/services/inventory-packages';
import { promoteAction } from '$lib/server/http/promote-action';
import { systemsOnQuotes } from '$lib/server/services/package-promotion';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const user = requireCapability(event, 'inventory:read');
	const [packages, systems] = await Promise.all([listLoadedPackages(), can(user.role, 'inventory:edit') ? systemsOnQuotes() : Promise.resolve([])]);
	return {
		systems,
		packages: packages.map((p) => {
			const bill = packageBillOfMaterials(p.groups);
			return {
				id: p.id,
				name: p.name,
				active: p.active,
				cabinets: bill.loudspeakers.reduce((n, l) => n + l.count, 0),
				amplifiers: bill.amplifiers.reduce((n, a) => n + a.count, 0),
				weightKg: bill.totalWeightKg,
				dayRateMinor: bill.totalDayRateMinor,
				flown: bill.flownHangs.length > 0
			};
		})
	};
};

export const actions: Actions = {
	/** Promote: a quote's system saved as a package (the same rules as POST /api/quotes/:id/package). */
	promote: (event) => promoteAction(event)
};

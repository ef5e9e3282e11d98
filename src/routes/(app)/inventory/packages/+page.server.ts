import { packageBillOfMaterials } from '$lib/inventory/bill-of-materials';
import { requireCapability } from '$lib/server/auth/guards';
import { listLoadedPackages } from '$lib/server/services/inventory-packages';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	requireCapability(event, 'inventory:read');
	const packages = await listLoadedPackages();
	return {
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

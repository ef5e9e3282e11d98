import { packageBillOfMaterials } from '$lib/inventory/bill-of-materials';
import { fail } from '@sveltejs/kit';
import { can } from '$lib/permissions';
import { requireCapability } from '$lib/server/auth/guards';
import { DomainError } from '$lib/server/services/errors';
import { listLoadedPackages } from '$lib/server/services/inventory-packages';
import { promoteSystem, systemsOnQuotes } from '$lib/server/services/package-promotion';
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
	promote: async (event) => {
		const user = requireCapability(event, 'inventory:edit');
		const form = await event.request.formData();
		const quoteId = Number(form.get('quoteId'));
		const name = String(form.get('name') ?? '').slice(0, 400);
		if (!Number.isInteger(quoteId) || quoteId < 1) return fail(422, { promoteError: 'Choose a quote', quoteId: 0, promoteName: name });
		try {
			const created = await promoteSystem(quoteId, { name, description: '' }, user.id);
			return { promoted: { id: created.id, name: created.name }, quoteId };
		} catch (err) {
			if (err instanceof DomainError) return fail(err.status, { promoteError: err.errors?.name?.[0] ?? err.message, quoteId, promoteName: name });
			throw err;
		}
	}
};

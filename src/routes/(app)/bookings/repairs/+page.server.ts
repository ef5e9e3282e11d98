import { fail } from '@sveltejs/kit';
import { z } from 'zod';
import { can } from '$lib/permissions';
import { repairFormSchema } from '$lib/schemas/bookings';
import { requireCapability } from '$lib/server/auth/guards';
import { recordRepair, unitsInRepair } from '$lib/server/services/damage-repairs';
import { DomainError } from '$lib/server/services/errors';
import { getSettings } from '$lib/server/services/settings';
import type { Actions, PageServerLoad } from './$types';

const unitIdSchema = z.object({ unitId: z.coerce.number().int().positive() });

/** Minor units per major unit of the currency (100 for GBP, 1 for JPY). */
function minorPerMajor(currency: string): number {
	return 10 ** (new Intl.NumberFormat('en-GB', { style: 'currency', currency }).resolvedOptions().maximumFractionDigits ?? 2);
}

export const load: PageServerLoad = async (event) => {
	const user = requireCapability(event, 'bookings:read');
	const [units, settings] = await Promise.all([unitsInRepair(), getSettings()]);
	return { units, currency: settings.currency, canHandle: can(user.role, 'bookings:handle') };
};

export const actions: Actions = {
	repair: async (event) => {
		const user = requireCapability(event, 'bookings:handle');
		const data = Object.fromEntries(await event.request.formData());
		const unit = unitIdSchema.safeParse(data);
		const parsed = repairFormSchema.safeParse(data);
		if (!unit.success || !parsed.success) {
			return fail(400, { unitId: unit.data?.unitId ?? null, ok: false, message: parsed.error?.issues[0].message ?? 'Choose the unit.' });
		}
		const costMinor = Math.round(parsed.data.cost * minorPerMajor((await getSettings()).currency));
		try {
			const { status } = await recordRepair(unit.data.unitId, { description: parsed.data.description, costMinor, done: parsed.data.done }, user);
			return { unitId: unit.data.unitId, ok: true, message: status === 'ready' ? 'Repair recorded; the unit is ready again.' : 'Repair recorded.' };
		} catch (err) {
			if (err instanceof DomainError) return fail(err.status, { unitId: unit.data.unitId, ok: false, message: err.message });
			throw err;
		}
	}
};

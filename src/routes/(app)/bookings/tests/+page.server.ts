import { fail } from '@sveltejs/kit';
import { z } from 'zod';
import { can } from '$lib/permissions';
import { testIntervalSchema } from '$lib/schemas/bookings';
import { requireCapability } from '$lib/server/auth/guards';
import { DomainError } from '$lib/server/services/errors';
import { modelIntervals, recordTestPassed, setModelInterval, unitsDueForTest } from '$lib/server/services/safety-tests';
import type { Actions, PageServerLoad } from './$types';
import type { ModelType } from '$lib/inventory/types';

const unitIdSchema = z.object({ unitId: z.coerce.number().int().positive() });
const today = () => new Date().toISOString().slice(0, 10);

export const load: PageServerLoad = async (event) => {
	const user = requireCapability(event, 'bookings:read');
	const [due, intervals] = await Promise.all([unitsDueForTest(today()), modelIntervals()]);
	return { due, intervals, today: today(), canHandle: can(user.role, 'bookings:handle') };
};

export const actions: Actions = {
	tested: async (event) => {
		requireCapability(event, 'bookings:handle');
		const parsed = unitIdSchema.safeParse(Object.fromEntries(await event.request.formData()));
		if (!parsed.success) return fail(400, { form: 'tested', ok: false, message: 'Choose the unit that was tested.' });
		try {
			await recordTestPassed(parsed.data.unitId, today());
			return { form: 'tested', unitId: parsed.data.unitId, ok: true, message: `Test recorded for today, ${today()}.` };
		} catch (err) {
			if (err instanceof DomainError) return fail(err.status, { form: 'tested', ok: false, message: err.message });
			throw err;
		}
	},
	interval: async (event) => {
		requireCapability(event, 'bookings:handle');
		const parsed = testIntervalSchema.safeParse(Object.fromEntries(await event.request.formData()));
		if (!parsed.success) return fail(400, { form: 'interval', ok: false, model: null, message: parsed.error.issues[0].message });
		const [modelType, id] = parsed.data.model.split(':') as [ModelType, string];
		try {
			await setModelInterval(modelType, Number(id), parsed.data.days);
			return { form: 'interval', model: parsed.data.model, ok: true, message: parsed.data.days ? `Every ${parsed.data.days} days.` : 'Company default.' };
		} catch (err) {
			if (err instanceof DomainError) return fail(err.status, { form: 'interval', ok: false, model: parsed.data.model, message: err.message });
			throw err;
		}
	}
};

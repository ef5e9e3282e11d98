import { fail } from '@sveltejs/kit';
import { z } from 'zod';
import { requireCapability } from '$lib/server/auth/guards';
import { DomainError, orHttpError } from '$lib/server/services/errors';
import { assignUnits, getPickList } from '$lib/server/services/pick-lists';
import type { Actions, PageServerLoad } from './$types';

const assignment = z.array(z.coerce.number().int().positive()).max(500);

export const load: PageServerLoad = async (event) => {
	requireCapability(event, 'bookings:read');
	return orHttpError(() => getPickList(Number(event.params.id)));
};

export const actions: Actions = {
	assign: async (event) => {
		requireCapability(event, 'bookings:handle');
		const parsed = assignment.safeParse((await event.request.formData()).getAll('unit'));
		if (!parsed.success) return fail(400, { error: 'The chosen units could not be read.' });
		try {
			await assignUnits(Number(event.params.id), parsed.data);
			return { saved: true };
		} catch (err) {
			if (err instanceof DomainError) return fail(err.status, { error: err.message });
			throw err;
		}
	}
};

import { fail } from '@sveltejs/kit';
import { z } from 'zod';
import { can } from '$lib/permissions';
import { damageSchema, scanSchema, siteAddressSchema } from '$lib/schemas/bookings';
import { requireCapability } from '$lib/server/auth/guards';
import { bookingLog, closeBooking, setSiteAddress } from '$lib/server/services/booking-life';
import { dispatchUnit, returnUnit } from '$lib/server/services/booking-scans';
import { reportDamage } from '$lib/server/services/damage-repairs';
import { DomainError } from '$lib/server/services/errors';
import { orHttpError } from '$lib/server/http/errors';
import { assignUnits, getPickList } from '$lib/server/services/pick-lists';
import type { Actions, PageServerLoad } from './$types';

const assignment = z.array(z.coerce.number().int().positive()).max(500);

export const load: PageServerLoad = async (event) => {
	const user = requireCapability(event, 'bookings:read');
	const id = Number(event.params.id);
	const [pick, log] = await Promise.all([orHttpError(() => getPickList(id)), bookingLog(id)]);
	return { ...pick, log, canHandle: can(user.role, 'bookings:handle') };
};

/** Runs a service call for one named form; a refusal comes back as that form's message, beside its button. */
async function attempt(form: string, work: () => Promise<string>) {
	try {
		return { form, ok: true, message: await work() };
	} catch (err) {
		if (err instanceof DomainError) return fail(err.status, { form, ok: false, message: err.message });
		throw err;
	}
}

async function scan(event: Parameters<Actions[string]>[0], mode: 'dispatch' | 'return') {
	const user = requireCapability(event, 'bookings:handle');
	const parsed = scanSchema.safeParse(Object.fromEntries(await event.request.formData()));
	if (!parsed.success) return fail(400, { form: 'scan', ok: false, message: parsed.error.issues[0].message });
	const id = Number(event.params.id);
	const today = new Date().toISOString().slice(0, 10);
	return attempt('scan', async () =>
		(mode === 'dispatch' ? await dispatchUnit(id, parsed.data.serial, user, today) : await returnUnit(id, parsed.data.serial, user)).message
	);
}

export const actions: Actions = {
	dispatch: (event) => scan(event, 'dispatch'),
	return: (event) => scan(event, 'return'),
	assign: async (event) => {
		requireCapability(event, 'bookings:handle');
		const parsed = assignment.safeParse((await event.request.formData()).getAll('unit'));
		if (!parsed.success) return fail(400, { form: 'assign', ok: false, message: 'The chosen units could not be read.' });
		return attempt('assign', async () => {
			await assignUnits(Number(event.params.id), parsed.data);
			return `${parsed.data.length} serial${parsed.data.length === 1 ? '' : 's'} reserved for this booking.`;
		});
	},
	damage: async (event) => {
		const user = requireCapability(event, 'bookings:handle');
		const data = await event.request.formData();
		const parsed = damageSchema.safeParse(Object.fromEntries(data));
		if (!parsed.success) return fail(400, { form: 'damage', ok: false, message: parsed.error.issues[0].message });
		const photo = data.get('photo');
		const file = photo instanceof File && photo.size > 0 ? { name: photo.name, bytes: new Uint8Array(await photo.arrayBuffer()) } : null;
		return attempt('damage', async () => {
			await reportDamage({ stockUnitId: parsed.data.unitId, bookingId: Number(event.params.id), notes: parsed.data.notes, photo: file }, user);
			return 'Damage reported; the unit is now in repair.';
		});
	},
	close: async (event) => {
		const user = requireCapability(event, 'bookings:handle');
		return attempt('close', async () => {
			await closeBooking(Number(event.params.id), user);
			return 'Booking closed.';
		});
	},
	address: async (event) => {
		requireCapability(event, 'bookings:handle');
		const parsed = siteAddressSchema.safeParse(Object.fromEntries(await event.request.formData()));
		if (!parsed.success) return fail(400, { form: 'address', ok: false, message: parsed.error.issues[0].message });
		return attempt('address', async () => {
			await setSiteAddress(Number(event.params.id), parsed.data.siteAddress);
			return 'Site address saved.';
		});
	}
};

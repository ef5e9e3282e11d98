import { json } from '@sveltejs/kit';
import { can } from '$lib/permissions';
import { requireCapability } from '$lib/server/auth/guards';
import { ownClientId } from '$lib/server/auth/signed-in-user';
import { orHttpError } from '$lib/server/http/errors';
import { bookingSummary, getPickList } from '$lib/server/services/pick-lists';
import type { RequestHandler } from './$types';

/** Staff get the pick list (units reserved, out, back, missing); a client only their own booking's state. */
export const GET: RequestHandler = async (event) => {
	const user = requireCapability(event, 'bookings:read', 'bookings:read-own');
	const id = Number(event.params.id);
	if (can(user.role, 'bookings:read')) return json(await orHttpError(() => getPickList(id)));
	const b = await orHttpError(() => bookingSummary(id, ownClientId(user)));
	return json({ id: b.id, reference: b.reference, eventName: b.eventName, startDate: b.startDate, endDate: b.endDate, state: b.state, stateWords: b.stateWords });
};

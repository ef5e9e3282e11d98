import { json } from '@sveltejs/kit';
import { can } from '$lib/permissions';
import { bookingListQuerySchema } from '$lib/schemas/bookings';
import { requireCapability } from '$lib/server/auth/guards';
import { ownClientId } from '$lib/server/auth/signed-in-user';
import { parseQuery } from '$lib/server/http/parse';
import { allBookings } from '$lib/server/services/pick-lists';
import type { RequestHandler } from './$types';

/** Every booking with its state (?state= to filter); a client gets only their own organisation's. */
export const GET: RequestHandler = async (event) => {
	const user = requireCapability(event, 'bookings:read', 'bookings:read-own');
	const { state } = parseQuery(event.url, bookingListQuerySchema);
	const staff = can(user.role, 'bookings:read');
	const list = await allBookings({ state, clientId: staff ? undefined : ownClientId(user) });
	return json(staff ? list : list.map(({ id, reference, eventName, startDate, endDate, state, stateWords }) => ({ id, reference, eventName, startDate, endDate, state, stateWords })));
};

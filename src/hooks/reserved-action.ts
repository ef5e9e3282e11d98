import { json, type Handle } from '@sveltejs/kit';

/**
 * SvelteKit throws (a 500) when a form posts to `?/default`, a reserved action name. It is never a
 * real form of ours, so answer it as the bad request it is.
 */
export const refuseReservedAction: Handle = async ({ event, resolve }) => {
	if (event.request.method === 'POST' && new URLSearchParams(event.url.search).has('/default')) {
		return json({ message: 'Unknown form action.' }, { status: 400 });
	}
	return resolve(event);
};

import { redirect } from '@sveltejs/kit';
import { signOut } from '../../../auth';
import { endSessions } from '$lib/server/services/users';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = () => redirect(303, '/');

export const actions: Actions = {
	default: async (event) => {
		// Ends this session and every other of the person's (the cookie alone would live on for hours).
		if (event.locals.user) await endSessions(event.locals.user.id);
		const headers = new Headers(event.request.headers);
		headers.delete('content-type');
		const body = new FormData();
		body.set('redirectTo', '/signin');
		await signOut({ ...event, request: new Request(event.request.url, { method: 'POST', headers, body }) });
	}
};

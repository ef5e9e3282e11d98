import { redirect } from '@sveltejs/kit';
import { signOut } from '../../../auth';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = () => redirect(303, '/');

export const actions: Actions = {
	default: async (event) => {
		const headers = new Headers(event.request.headers);
		headers.delete('content-type');
		const body = new FormData();
		body.set('redirectTo', '/signin');
		await signOut({ ...event, request: new Request(event.request.url, { method: 'POST', headers, body }) });
	}
};

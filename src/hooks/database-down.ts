import type { Handle } from '@sveltejs/kit';
import { databaseAnswers } from '$lib/server/health';
import { unavailable } from './unavailable';

/**
 * attach-user turns a failed user lookup into a calm 503, but the user row is cached for a few
 * seconds, so a page or API call can get past it and meet the stopped database in its own query.
 * Such a 500 becomes the same 503; the error is still logged with its reference by handleError.
 */
export const databaseDown: Handle = async ({ event, resolve }) => {
	const response = await resolve(event);
	if (response.status === 500 && !(await databaseAnswers())) return unavailable(event);
	return response;
};

import { json } from '@sveltejs/kit';
import { databaseAnswers } from '$lib/server/health';
import type { RequestHandler } from './$types';

// Public on purpose: load balancers and the start script poll it without signing in.
export const GET: RequestHandler = async () => {
	const ok = await databaseAnswers();
	return json({ status: ok ? 'ok' : 'degraded', db: ok ? 'ok' : 'down' }, { status: ok ? 200 : 503 });
};

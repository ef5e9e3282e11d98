import { json, type RequestEvent } from '@sveltejs/kit';

export const DATABASE_DOWN_MESSAGE = 'The database is not answering just now. Nothing was changed; please try again shortly.';

/**
 * A calm 503 when the database is down: JSON for the API, an action result for a form that
 * JavaScript submitted (so the page shows the message), and a small page for everything else.
 */
export function unavailable(event: RequestEvent): Response {
	const headers = { 'retry-after': '10' };
	if (event.url.pathname.startsWith('/api/')) {
		return json({ message: DATABASE_DOWN_MESSAGE }, { status: 503, headers });
	}
	if (event.request.headers.get('x-sveltekit-action') === 'true') {
		return json({ type: 'error', status: 503, error: { message: DATABASE_DOWN_MESSAGE } }, { status: 503, headers });
	}
	const html = `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1"><title>Throwline is catching its breath</title></head><body style="font-family:system-ui,sans-serif;max-width:32rem;margin:4rem auto;padding:0 1rem;color:#1b2a33"><h1 style="font-size:1.4rem">Throwline is catching its breath</h1><p>${DATABASE_DOWN_MESSAGE}</p></body></html>`;
	return new Response(html, {
		status: 503,
		headers: { 'content-type': 'text/html; charset=utf-8', 'retry-after': '10' }
	});
}

import { json } from '@sveltejs/kit';
import { requireCapability } from '$lib/server/auth/guards';
import { parseJsonBody } from '$lib/server/http/parse';
import { quoteRequestSchema } from '$lib/schemas/evaluation';
import { orHttpError } from '$lib/server/http/errors';
import { suggestForDesk } from '$lib/server/services/suggestions';
import type { RequestHandler } from './$types';

const NDJSON = 'application/x-ndjson';

/**
 * Up to five cheapest clear systems in stock for a request (the body of POST /api/evaluations).
 * Asked with `Accept: application/x-ndjson`, it streams `{ checked }` lines while it searches and
 * ends with `{ answer }`, so the page can show progress; otherwise it answers one JSON body.
 */
export const POST: RequestHandler = async (event) => {
	requireCapability(event, 'evaluations:run');
	const input = await parseJsonBody(event.request, quoteRequestSchema);
	if (!event.request.headers.get('accept')?.includes(NDJSON)) return json(await orHttpError(() => suggestForDesk(input)));

	const encoder = new TextEncoder();
	let lastSent = 0;
	const stream = new ReadableStream<Uint8Array>({
		async start(controller) {
			const line = (value: unknown) => controller.enqueue(encoder.encode(`${JSON.stringify(value)}\n`));
			try {
				const answer = await suggestForDesk(input, {
					onProgress: (checked) => {
						if (Date.now() - lastSent < 150) return;
						lastSent = Date.now();
						line({ checked });
					}
				});
				line({ answer });
			} catch (err) {
				const status = (err as { status?: number }).status;
				line({ problem: status && status < 500 ? (err as Error).message : 'The search failed; try again.' });
			}
			controller.close();
		}
	});
	return new Response(stream, { headers: { 'content-type': NDJSON, 'cache-control': 'no-store' } });
};

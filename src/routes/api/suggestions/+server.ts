import { error, json } from '@sveltejs/kit';
import { requireCapability } from '$lib/server/auth/guards';
import { parseJsonBody } from '$lib/server/http/parse';
import { quoteRequestSchema } from '$lib/schemas/evaluation';
import { SearchBusyError } from '$lib/server/search/run-search';
import { DomainError } from '$lib/server/services/errors';
import { beginSuggestions, type SuggestionSearch } from '$lib/server/services/suggestions';
import type { RequestHandler } from './$types';

const NDJSON = 'application/x-ndjson';

/**
 * Up to five cheapest clear systems in stock for a request (the body of POST /api/evaluations).
 * Asked with `Accept: application/x-ndjson`, it streams `{ checked }` lines while it searches and
 * ends with `{ answer }`, so the page can show progress; otherwise it answers one JSON body. The
 * search runs in a worker thread; while this process already runs its share of searches it
 * answers 503 with Retry-After.
 */
export const POST: RequestHandler = async (event) => {
	requireCapability(event, 'evaluations:run');
	const input = await parseJsonBody(event.request, quoteRequestSchema);
	let search: SuggestionSearch;
	try {
		search = await beginSuggestions(input);
	} catch (err) {
		if (err instanceof SearchBusyError) return json({ message: err.message }, { status: 503, headers: { 'retry-after': String(err.retryAfterSeconds) } });
		if (err instanceof DomainError) error(err.status, { message: err.message, errors: err.errors });
		throw err;
	}
	if (!event.request.headers.get('accept')?.includes(NDJSON)) return json(await search.answer());

	const encoder = new TextEncoder();
	let lastSent = 0;
	// A client that went away cancels the stream; the search still ends at its deadline.
	let open = true;
	const stream = new ReadableStream<Uint8Array>({
		async start(controller) {
			const line = (value: unknown) => {
				if (!open) return;
				try {
					controller.enqueue(encoder.encode(`${JSON.stringify(value)}\n`));
				} catch {
					open = false;
				}
			};
			try {
				const answer = await search.answer((checked) => {
					if (Date.now() - lastSent < 150) return;
					lastSent = Date.now();
					line({ checked });
				});
				line({ answer });
			} catch {
				line({ problem: 'The search failed; try again.' });
			}
			if (open) {
				open = false;
				controller.close();
			}
		},
		cancel() {
			open = false;
		}
	});
	return new Response(stream, { headers: { 'content-type': NDJSON, 'cache-control': 'no-store' } });
};

import { error } from '@sveltejs/kit';
import type { z } from 'zod';
import { fieldErrors } from '../services/errors';

const MAX_BODY_BYTES = 256 * 1024;

/**
 * Reads a JSON body and validates it with a shared schema.
 * Unreadable JSON or the wrong content type → 400; well-formed but invalid values → 422.
 */
export async function parseJsonBody<S extends z.ZodType>(request: Request, schema: S): Promise<z.output<S>> {
	const type = request.headers.get('content-type') ?? '';
	if (!type.toLowerCase().startsWith('application/json')) {
		error(400, { message: 'Send the body as application/json.' });
	}
	const length = Number(request.headers.get('content-length') ?? 0);
	if (length > MAX_BODY_BYTES) error(413, { message: 'The body is too large.' });
	let body: unknown;
	try {
		const text = await request.text();
		if (text.length > MAX_BODY_BYTES) error(413, { message: 'The body is too large.' });
		body = JSON.parse(text);
	} catch (err) {
		if ((err as { status?: number }).status) throw err;
		error(400, { message: 'The body is not valid JSON.' });
	}
	const result = schema.safeParse(body);
	if (!result.success) {
		error(422, { message: 'Some fields need attention.', errors: fieldErrors(result.error.issues) });
	}
	return result.data;
}

/** Validates a URL's search parameters with a shared schema; invalid values → 422 with field errors. */
export function parseQuery<S extends z.ZodType>(url: URL, schema: S): z.output<S> {
	const result = schema.safeParse(Object.fromEntries(url.searchParams.entries()));
	if (!result.success) error(422, { message: 'Some parameters need attention.', errors: fieldErrors(result.error.issues) });
	return result.data;
}

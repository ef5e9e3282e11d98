import { error } from '@sveltejs/kit';

/** A rule of the business that refused a request; routes turn it into the matching HTTP answer. */
export class DomainError extends Error {
	constructor(
		readonly status: 400 | 403 | 404 | 409 | 422 | 429 | 503,
		message: string,
		readonly errors?: Record<string, string[]>
	) {
		super(message);
	}
}

/** Runs a service call and maps a DomainError to SvelteKit's error(), keeping one envelope. */
export async function orHttpError<T>(work: () => Promise<T>): Promise<T> {
	try {
		return await work();
	} catch (err) {
		if (err instanceof DomainError) error(err.status, { message: err.message, errors: err.errors });
		throw err;
	}
}

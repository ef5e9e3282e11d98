import { error } from '@sveltejs/kit';
import { DomainError } from '../services/errors';

/** Runs a service call and maps a DomainError to SvelteKit's error(), keeping one envelope. */
export async function orHttpError<T>(work: () => Promise<T>): Promise<T> {
	try {
		return await work();
	} catch (err) {
		if (err instanceof DomainError) error(err.status, { message: err.message, errors: err.errors });
		throw err;
	}
}

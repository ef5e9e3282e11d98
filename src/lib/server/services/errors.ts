import type { z } from 'zod';

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

/** Field errors in the one envelope every API route answers with: { message, errors: { field: [..] } }. */
export function fieldErrors(issues: z.core.$ZodIssue[]): Record<string, string[]> {
	const errors: Record<string, string[]> = {};
	for (const issue of issues) {
		const key = issue.path.length ? issue.path.join('.') : '_';
		(errors[key] ??= []).push(issue.message);
	}
	return errors;
}

/**
 * Input errors. The model never returns a silent nonsense result: a request or package it cannot
 * evaluate throws an AcousticsInputError whose message names the offending value and what to fix,
 * so an API can answer 422 with the message as it is.
 */
export class AcousticsInputError extends Error {
	constructor(message: string) {
		super(message);
		this.name = 'AcousticsInputError';
	}
}

export function fail(message: string): never {
	throw new AcousticsInputError(message);
}

/**
 * What a checked value is, for the message: a string, or a function called only when the check
 * fails (so the hot path builds no strings), optionally followed by the field's name.
 */
export type Description = string | (() => string);

export function describe(what: Description, field?: string): string {
	const subject = typeof what === 'function' ? what() : what;
	return field === undefined ? subject : `${subject}: ${field}`;
}

export function requireFinite(value: unknown, what: Description, field?: string): number {
	if (typeof value !== 'number' || !Number.isFinite(value))
		fail(`${describe(what, field)} must be a finite number (got ${String(value)}).`);
	return value;
}

export function requirePositive(value: unknown, what: Description, field?: string): number {
	const n = requireFinite(value, what, field);
	if (n <= 0) fail(`${describe(what, field)} must be greater than zero (got ${n}).`);
	return n;
}

export function requireWholeCount(value: unknown, what: Description, field?: string): number {
	const n = requireFinite(value, what, field);
	if (n < 1 || !Number.isInteger(n))
		fail(`${describe(what, field)} must be a whole number of at least 1 (got ${n}).`);
	return n;
}

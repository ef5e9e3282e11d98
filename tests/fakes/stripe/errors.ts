// Stripe's error envelope: { error: { type, code, message, param, ... } } with the HTTP status the SDK
// maps to its error classes (400/404 invalid request, 401 authentication, 402 card, 5xx API error).
export type StripeErrorType =
	'invalid_request_error' | 'card_error' | 'api_error' | 'idempotency_error';

export class FakeStripeError extends Error {
	constructor(
		readonly status: number,
		readonly type: StripeErrorType,
		message: string,
		readonly code?: string,
		readonly param?: string,
		readonly extra: Record<string, unknown> = {}
	) {
		super(message);
	}

	toBody(): { error: Record<string, unknown> } {
		return {
			error: {
				...(this.code
					? {
							code: this.code,
							doc_url: `https://stripe.com/docs/error-codes/${this.code.replace(/_/g, '-')}`
						}
					: {}),
				message: this.message,
				...(this.param ? { param: this.param } : {}),
				type: this.type,
				...this.extra
			}
		};
	}
}

export const invalid = (message: string, code?: string, param?: string) =>
	new FakeStripeError(400, 'invalid_request_error', message, code, param);

export const missingParam = (param: string) =>
	new FakeStripeError(
		400,
		'invalid_request_error',
		`Missing required param: ${param}.`,
		'parameter_missing',
		param
	);

export const unknownParam = (param: string) =>
	new FakeStripeError(
		400,
		'invalid_request_error',
		`Received unknown parameter: ${param}`,
		'parameter_unknown',
		param
	);

export const invalidInteger = (param: string, value: unknown) =>
	new FakeStripeError(
		400,
		'invalid_request_error',
		`Invalid integer: ${String(value)}`,
		'parameter_invalid_integer',
		param
	);

export const noSuch = (kind: string, id: string, param = 'id') =>
	new FakeStripeError(
		404,
		'invalid_request_error',
		`No such ${kind}: '${id}'`,
		'resource_missing',
		param
	);

export const unrecognizedUrl = (method: string, path: string) =>
	new FakeStripeError(
		404,
		'invalid_request_error',
		`Unrecognized request URL (${method}: ${path}). This is the local Stripe stand-in; it implements only the endpoints Throwline uses.`
	);

export const authError = (message: string) =>
	new FakeStripeError(401, 'invalid_request_error', message);

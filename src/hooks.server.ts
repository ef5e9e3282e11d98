import type { HandleServerError, ServerInit } from '@sveltejs/kit';
import { sequence } from '@sveltejs/kit/hooks';
import { handle as authHandle } from './auth';
import { attachUser } from './hooks/attach-user';
import { databaseDown } from './hooks/database-down';
import { guardPages } from './hooks/guard-pages';
import { refuseReservedAction } from './hooks/reserved-action';
import { securityHeaders } from './hooks/security-headers';
import { throttleSignIn } from './hooks/throttle-sign-in';
import { startMailRetry } from '$lib/server/mail/retry';
import { db } from '$lib/server/db';

/**
 * Once per server start: the database models are registered first (the retry timer queries them
 * before any request may have come), then messages the SMTP server did not take are retried on a
 * timer. On shutdown (adapter-node's event, after the server closed) the timer stops and the pool
 * closes: a retry pass every few seconds would otherwise keep the pool, and so the process, alive
 * after SIGTERM.
 */
export const init: ServerInit = () => {
	db();
	const retry = startMailRetry();
	process.once('sveltekit:shutdown', () => {
		retry.stop();
		void db().close();
	});
};

export const handle = sequence(securityHeaders, databaseDown, refuseReservedAction, throttleSignIn, authHandle, attachUser, guardPages);

/** Unexpected errors are logged with a reference; the person sees the reference, never a stack. */
export const handleError: HandleServerError = ({ error, status, message }) => {
	if (status === 404) return { message: 'Not found' };
	// The framework's own refusals of a request (413 over BODY_SIZE_LIMIT, 400 for a malformed one)
	// are the request's fault, not incidents: say what was wrong and log nothing.
	if (status === 413) return { message: 'The body is too large.' };
	if (status >= 400 && status < 500) return { message };
	const reference = crypto.randomUUID().slice(0, 8);
	console.error(`[error ${reference}]`, error);
	return { message: `Something went wrong on our side (reference ${reference}).` };
};

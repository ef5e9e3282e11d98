import type { HandleServerError } from '@sveltejs/kit';
import { sequence } from '@sveltejs/kit/hooks';
import { handle as authHandle } from './auth';
import { attachUser } from './hooks/attach-user';
import { guardPages } from './hooks/guard-pages';
import { securityHeaders } from './hooks/security-headers';

export const handle = sequence(securityHeaders, authHandle, attachUser, guardPages);

/** Unexpected errors are logged with a reference; the person sees the reference, never a stack. */
export const handleError: HandleServerError = ({ error, status }) => {
	if (status === 404) return { message: 'Not found' };
	const reference = crypto.randomUUID().slice(0, 8);
	console.error(`[error ${reference}]`, error);
	return { message: `Something went wrong on our side (reference ${reference}).` };
};

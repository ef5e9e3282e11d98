import { json } from '@sveltejs/kit';
import { requireCapability } from '$lib/server/auth/guards';
import { createBalanceInvoice } from '$lib/server/services/balance-invoice';
import { orHttpError } from '$lib/server/http/errors';
import type { RequestHandler } from './$types';

/**
 * Issues the balance invoice of a confirmed hire (201). Asked again while the first is still being
 * recorded: 200 with the same invoice and no second e-mail. 409 if not confirmed or already invoiced.
 */
export const POST: RequestHandler = async (event) => {
	const user = requireCapability(event, 'invoices:issue');
	const { created, ...outcome } = await orHttpError(() => createBalanceInvoice(Number(event.params.id), user));
	return json(outcome, { status: created ? 201 : 200 });
};

import { json } from '@sveltejs/kit';
import { requireCapability } from '$lib/server/auth/guards';
import { invoiceBalance } from '$lib/server/services/balance';
import { orHttpError } from '$lib/server/services/errors';
import type { RequestHandler } from './$types';

/** Issues the balance invoice of a confirmed hire (201); 409 if not confirmed or already invoiced. */
export const POST: RequestHandler = async (event) => {
	const user = requireCapability(event, 'invoices:issue');
	return json(await orHttpError(() => invoiceBalance(Number(event.params.id), user)), { status: 201 });
};

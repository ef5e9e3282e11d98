import { fail } from '@sveltejs/kit';
import { canAny } from '$lib/permissions';
import { allowedActions, type QuoteAction } from '$lib/quotes/states';
import { requireCapability } from '$lib/server/auth/guards';
import { DomainError, orHttpError } from '$lib/server/services/errors';
import { hireStateForClient } from '$lib/server/services/booking-life';
import { applyQuoteAction } from '$lib/server/services/quote-actions';
import { invoiceBalance } from '$lib/server/services/balance';
import { getQuote } from '$lib/server/services/quotes';
import type { Actions, PageServerLoad, RequestEvent } from './$types';

export const load: PageServerLoad = async (event) => {
	const user = requireCapability(event, 'quotes:read');
	event.depends('app:quotes');
	const quote = await orHttpError(() => getQuote(Number(event.params.id), user));
	// getQuote already refused a client another organisation's quote, so the hire's state is theirs.
	const hire = canAny(user.role, 'bookings:read', 'bookings:read-own') ? await hireStateForClient(quote.id) : null;
	return { quote, actions: allowedActions(quote.status), hire };
};

function act(action: QuoteAction) {
	return async (event: RequestEvent) => {
		const user = requireCapability(event, 'quotes:act');
		try {
			const outcome = await applyQuoteAction(Number(event.params.id), action, user);
			return { done: action, mailSent: outcome.mailSent ?? null };
		} catch (err) {
			if (err instanceof DomainError) return fail(err.status, { actionError: err.message });
			throw err;
		}
	};
}

export const actions: Actions = {
	send: act('send'),
	accept: act('accept'),
	cancel: act('cancel'),
	close: act('close'),
	balance: async (event) => {
		const user = requireCapability(event, 'invoices:issue');
		try {
			const outcome = await invoiceBalance(Number(event.params.id), user);
			return { done: 'balance', mailSent: outcome.mailSent };
		} catch (err) {
			if (err instanceof DomainError) return fail(err.status, { actionError: err.message });
			throw err;
		}
	}
};

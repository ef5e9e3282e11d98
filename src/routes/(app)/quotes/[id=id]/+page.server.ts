import { fail } from '@sveltejs/kit';
import { can, canAny } from '$lib/permissions';
import { cancelConsequences } from '$lib/quotes/cancel-consequence';
import { allowedActions, isExpired, type QuoteAction } from '$lib/quotes/states';
import type { QuoteActionInput } from '$lib/schemas/quotes';
import { requireCapability } from '$lib/server/auth/guards';
import { DomainError } from '$lib/server/services/errors';
import { promoteAction } from '$lib/server/http/promote-action';
import { orHttpError } from '$lib/server/http/errors';
import { applyQuoteAction, termsFor } from '$lib/server/services/quote-actions';
import { bookingStateForClient } from '$lib/server/services/booking-life';
import { createBalanceInvoice } from '$lib/server/services/balance-invoice';
import { getQuote } from '$lib/server/services/quotes';
import { getSettings } from '$lib/server/services/settings';
import type { Actions, PageServerLoad, RequestEvent } from './$types';

const today = () => new Date().toISOString().slice(0, 10);

export const load: PageServerLoad = async (event) => {
	const user = requireCapability(event, 'quotes:read');
	event.depends('app:quotes');
	const [quote, settings] = await Promise.all([orHttpError(() => getQuote(Number(event.params.id), user)), getSettings()]);
	const expired = quote.status === 'sent' && isExpired(quote.validUntil, today());
	// getQuote already refused a client another organisation's quote, so the hire's state is theirs.
	const booking = canAny(user.role, 'bookings:read', 'bookings:read-own') ? await bookingStateForClient(quote.id) : null;
	const actions = allowedActions(quote.status);
	const cancelNotice = actions.includes('cancel') && can(user.role, 'quotes:write')
		? cancelConsequences({ status: quote.status, startDate: quote.startDate, today: today(), cancellationFullRefundDays: settings.cancellationFullRefundDays, invoices: quote.invoices })
		: null;
	const canPromote = quote.system !== null && can(user.role, 'inventory:edit');
	return { quote, actions, terms: termsFor(quote, settings), expired, booking, cancelNotice, canPromote };
};

/** The form's extra fields: the ticked terms box and the client's message. */
async function formInput(event: RequestEvent, action: QuoteAction): Promise<QuoteActionInput> {
	const form = await event.request.formData();
	const message = String(form.get('message') ?? '').trim().slice(0, 4000);
	return { action, acceptTerms: form.get('acceptTerms') === 'on', ...(message ? { message } : {}) };
}

function act(action: QuoteAction) {
	return async (event: RequestEvent) => {
		const user = requireCapability(event, 'quotes:act');
		try {
			const outcome = await applyQuoteAction(Number(event.params.id), await formInput(event, action), user);
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
	decline: act('decline'),
	requestChange: act('request-change'),
	// Cancelling can refund a deposit and e-mails the client: the form must carry the ticked confirmation.
	cancel: async (event) => {
		requireCapability(event, 'quotes:write'); // a staff action: a client is refused before the form is read
		const confirmed = (await event.request.clone().formData()).get('confirmCancel') === 'on';
		if (!confirmed) return fail(400, { actionError: 'Tick “Yes, cancel this quote” to confirm. Nothing has changed.' });
		return act('cancel')(event);
	},
	close: act('close'),
	promote: (event) => promoteAction(event, Number(event.params.id)),
	balanceInvoice: async (event) => {
		const user = requireCapability(event, 'invoices:issue');
		try {
			const outcome = await createBalanceInvoice(Number(event.params.id), user);
			return { done: 'balance-invoice', mailSent: outcome.mailSent };
		} catch (err) {
			if (err instanceof DomainError) return fail(err.status, { actionError: err.message });
			throw err;
		}
	}
};

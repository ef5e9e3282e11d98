import { fail, type RequestEvent } from '@sveltejs/kit';
import type { PromoteOutcome } from '$lib/systems/promote';
import { requireCapability } from '../auth/guards';
import { DomainError } from '../services/errors';
import { promoteSystem } from '../services/package-promotion';

/**
 * The "Save as a package" form action, on a quote's page (the quote is the page's) and in
 * Inventory → Packages (the form names the quote). A refusal goes beside the name field.
 */
export async function promoteAction(event: RequestEvent, pageQuoteId?: number) {
	const user = requireCapability(event, 'inventory:edit');
	const form = await event.request.formData();
	const quoteId = pageQuoteId ?? Number(form.get('quoteId'));
	const promoteName = String(form.get('name') ?? '').slice(0, 400);
	if (!Number.isInteger(quoteId) || quoteId < 1) return fail(422, { promoteError: 'Choose a quote', quoteId: 0, promoteName } satisfies PromoteOutcome);
	try {
		const created = await promoteSystem(quoteId, { name: promoteName, description: '' }, user.id);
		return { promoted: { id: created.id, name: created.name }, quoteId } satisfies PromoteOutcome;
	} catch (err) {
		if (!(err instanceof DomainError)) throw err;
		return fail(err.status, { promoteError: err.errors?.name?.[0] ?? err.message, quoteId, promoteName } satisfies PromoteOutcome);
	}
}

import { fail } from '@sveltejs/kit';
import { requireCapability } from '$lib/server/auth/guards';
import { readImportForm } from '$lib/server/http/inventory-pages';
import { DomainError } from '$lib/server/services/errors';
import { applyImport, previewImport } from '$lib/server/services/inventory-csv';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	requireCapability(event, 'inventory:edit');
	return {};
};

export const actions: Actions = {
	/** Step 1: what the file would do, row by row; nothing is written. */
	preview: async (event) => {
		requireCapability(event, 'inventory:edit');
		const input = await readImportForm(event.request);
		if ('error' in input) return fail(400, { error: input.error });
		return { kind: input.kind, csv: input.text, preview: await previewImport(input.kind, input.text) };
	},
	/** Step 2: all rows or none, in one transaction. */
	apply: async (event) => {
		const actor = requireCapability(event, 'inventory:edit');
		const input = await readImportForm(event.request);
		if ('error' in input) return fail(400, { error: input.error });
		try {
			return { kind: input.kind, applied: await applyImport(input.kind, input.text, actor.id) };
		} catch (err) {
			if (!(err instanceof DomainError)) throw err;
			return fail(err.status, { kind: input.kind, csv: input.text, error: err.message, preview: await previewImport(input.kind, input.text) });
		}
	}
};

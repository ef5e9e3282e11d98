/** Shared by the new-quote and revise pages: what the request form needs, and saving it. */
import { fail, redirect, type ActionFailure } from '@sveltejs/kit';
import { setError, superValidate, type SuperValidated } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import type { z } from 'zod';
import { formFieldOf, quoteRequestFormSchema, type QuoteRequestForm } from '$lib/schemas/quotes';
import { composedFrom } from '$lib/systems/compose';
import { AmplifierModel, Client, LoudspeakerModel } from '../db';
import { loadedPackages } from '../services/catalogue';
import { DomainError } from '../services/errors';
import { listProgrammes } from '../services/programmes';
import { getSettings } from '../services/settings';
import { listSites } from '../services/sites';

export async function quoteRequestFormOptions() {
	const [clients, programmes, settings, sites, composer] = await Promise.all([
		Client.findAll({ attributes: ['id', 'name'], order: [['name', 'ASC']] }),
		listProgrammes(),
		getSettings(),
		listSites(),
		composerCatalogue()
	]);
	return {
		clients: clients.map((c) => ({ id: c.id, name: c.name })),
		programmes: programmes.map((p) => ({ slug: p.slug, name: p.name, crestFactorDb: p.crestFactorDb, isTypical: p.isTypical })),
		sites: sites.map((s) => ({ id: s.id, name: s.name, receiverCount: s.receiverCount })),
		defaultMarginDb: settings.defaultMarginDb,
		distanceUnit: settings.distanceUnit,
		composer
	};
}

/** What the composer chooses from: the models, and each active package's groups to start from. */
async function composerCatalogue() {
	const [loudspeakers, amplifiers, packages] = await Promise.all([
		LoudspeakerModel.findAll({ attributes: ['id', 'name', 'kind', 'impedanceOhm'], order: [['name', 'ASC']] }),
		AmplifierModel.findAll({ attributes: ['id', 'name', 'channels', 'minLoadOhm'], order: [['name', 'ASC']] }),
		loadedPackages({ activeOnly: true })
	]);
	return {
		loudspeakers: loudspeakers.map((m) => ({ id: m.id, name: m.name, kind: m.kind, impedanceOhm: m.impedanceOhm })),
		amplifiers: amplifiers.map((m) => ({ id: m.id, name: m.name, channels: m.channels, minLoadOhm: m.minLoadOhm })),
		packages: packages.map((p) => ({ id: p.id, groups: composedFrom(p.groups) }))
	};
}

/** Validates the flat form as an API body; puts every problem on the field it belongs to. */
export async function saveFromForm<S extends z.ZodType>(
	request: Request,
	bodySchema: S,
	toBody: (form: QuoteRequestForm) => Record<string, unknown>,
	save: (input: z.output<S>) => Promise<{ id: number }>
): Promise<ActionFailure<{ form: SuperValidated<QuoteRequestForm> }>> {
	const form = await superValidate(request, zod4(quoteRequestFormSchema));
	if (!form.valid) return fail(400, { form });
	const parsed = bodySchema.safeParse(toBody(form.data));
	if (!parsed.success) {
		for (const issue of parsed.error.issues) {
			const field = formFieldOf(issue.path.join('.'));
			setError(form, field ?? '', issue.message);
		}
		return fail(422, { form });
	}
	let id: number;
	try {
		id = (await save(parsed.data)).id;
	} catch (err) {
		if (!(err instanceof DomainError)) throw err;
		const [path, messages] = Object.entries(err.errors ?? {})[0] ?? [];
		return setError(form, (path && formFieldOf(path)) || '', messages?.[0] ?? err.message, { status: err.status });
	}
	redirect(303, `/quotes/${id}`);
}

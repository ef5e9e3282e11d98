import { fail, redirect } from '@sveltejs/kit';
import { message, setError, type SuperValidated } from 'sveltekit-superforms';
import { DomainError } from '../services/errors';
import { deleteAttachment, listAttachments, saveAttachment } from '../services/inventory-attachments';
import { listHistory } from '../services/inventory-history';
import { MAX_CSV_BYTES, type CsvKind } from '../services/inventory-csv';
import { amplifiers, loudspeakers } from '../services/inventory-resources';
import type { ModelType } from '$lib/inventory/types';


/**
 * Puts a service's refusal on the form: each field error beside its field (service keys such as
 * `groups.1.cabinetsPerChannel` become superforms paths), anything else as the form's message.
 */
export function refusal<T extends Record<string, unknown>>(form: SuperValidated<T>, err: unknown) {
	if (!(err instanceof DomainError)) throw err;
	const fieldErrors = Object.entries(err.errors ?? {}).filter(([key]) => key !== '_');
	if (fieldErrors.length === 0) return message(form, err.message, { status: err.status });
	let failure;
	for (const [key, messages] of fieldErrors) {
		const path = key.replace(/\.(\d+)(?=\.|$)/g, '[$1]');
		failure = setError(form, path as never, messages, { status: err.status, overwrite: true });
	}
	return failure!;
}

/** Everything the model detail page shows: the model, its spec history and its attachments. */
export async function modelDetail<R>(modelType: ModelType, id: number, getModel: (id: number) => Promise<R>) {
	const model = await getModel(id);
	const [history, attachments] = await Promise.all([listHistory(modelType, id), listAttachments(modelType, id)]);
	return { model, history, attachments };
}

/** The detail page's upload action: answers with a message instead of throwing, so the page stays. */
export async function uploadFromForm(request: Request, modelType: ModelType, modelId: number, userId: number) {
	const form = await request.formData();
	const file = form.get('file');
	const kind = form.get('kind');
	if (!(file instanceof File) || file.size === 0) return fail(422, { attachmentError: 'Choose a file to upload.' });
	if (kind !== 'spec-sheet' && kind !== 'photo') return fail(422, { attachmentError: 'Choose spec sheet or photo.' });
	try {
		await saveAttachment({ modelType, modelId, kind, originalName: file.name, bytes: new Uint8Array(await file.arrayBuffer()), userId });
		return { uploaded: true };
	} catch (err) {
		if (err instanceof DomainError) return fail(err.status, { attachmentError: err.message });
		throw err;
	}
}

export async function removeAttachmentFromForm(request: Request) {
	const id = Number((await request.formData()).get('attachmentId'));
	if (!Number.isInteger(id) || id <= 0) return fail(400, { attachmentError: 'That attachment could not be read.' });
	try {
		await deleteAttachment(id);
		return { removed: true };
	} catch (err) {
		if (err instanceof DomainError) return fail(err.status, { attachmentError: err.message });
		throw err;
	}
}

/** Deletes and goes back to the list, or stays with the reason (409 while in use). */
export async function deleteOrExplain(remove: () => Promise<void>, listHref: string) {
	try {
		await remove();
	} catch (err) {
		if (err instanceof DomainError) return fail(err.status, { deleteError: err.message });
		throw err;
	}
	redirect(303, listHref);
}

/** Model choices for the package form, with what it needs to show each group's load live. */
export async function packageFormOptions() {
	const [speakers, amps] = await Promise.all([loudspeakers.list(), amplifiers.list()]);
	return {
		loudspeakerOptions: speakers.map((m) => ({ id: m.id, label: `${m.maker} ${m.name}`, impedanceOhm: m.impedanceOhm, name: m.name })),
		amplifierOptions: amps.map((m) => ({ id: m.id, label: `${m.maker} ${m.name}`, minLoadOhm: m.minLoadOhm, channels: m.channels, name: m.name }))
	};
}

/** Model choices for the stock-unit form. */
export async function unitFormOptions() {
	const [speakers, amps] = await Promise.all([loudspeakers.list(), amplifiers.list()]);
	return {
		loudspeakerOptions: speakers.map((m) => ({ id: m.id, label: `${m.maker} ${m.name}` })),
		amplifierOptions: amps.map((m) => ({ id: m.id, label: `${m.maker} ${m.name}` }))
	};
}

/** The import page's form: which list, and the CSV either as a chosen file or carried over from the preview. */
export async function readImportForm(request: Request): Promise<{ kind: CsvKind; text: string } | { error: string }> {
	const form = await request.formData();
	const kind = form.get('kind');
	if (kind !== 'loudspeakers' && kind !== 'amplifiers') return { error: 'Choose loudspeakers or amplifiers.' };
	const file = form.get('file');
	const carried = form.get('csv');
	const text = file instanceof File && file.size > 0 ? (file.size > MAX_CSV_BYTES ? null : await file.text()) : typeof carried === 'string' ? carried : '';
	if (text === null || new TextEncoder().encode(text).length > MAX_CSV_BYTES) return { error: 'The file is larger than 1 MB.' };
	if (!text.trim()) return { error: 'Choose a CSV file.' };
	return { kind, text };
}

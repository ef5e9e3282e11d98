/**
 * Inventory rows the proof suite owns: one of each for routes that read by id, and throwaway rows
 * for the routes that delete, so a delete that is allowed only ever removes the suite's own row.
 */
import { BASE_URL } from '../browser';
import { api } from '../http';
import { amplifierBody, loudspeakerBody, makeFixtures, tag } from '../inventory-helpers';

/** The smallest file the upload check takes for a spec sheet: it is judged by its first bytes. */
export const TINY_PDF = Buffer.from('%PDF-1.4\n1 0 obj<<>>endobj\ntrailer<<>>\n%%EOF\n');

export type ThrowawayKind = 'loudspeaker' | 'amplifier' | 'package' | 'unit' | 'attachment' | 'site';

/** Where an admin reads one row of each kind (200 while it exists, 404 after). */
export const ROW_URL: Record<ThrowawayKind, string> = {
	loudspeaker: '/api/loudspeakers',
	amplifier: '/api/amplifiers',
	package: '/api/packages',
	unit: '/api/stock-units',
	attachment: '/api/attachments',
	site: '/api/sites'
};

export interface InventoryFixtures {
	speakerId: number;
	ampId: number;
	packageId: number;
	unitId: number;
	attachmentId: number;
}

export async function uploadAttachment(
	adminCookie: string,
	modelPath: string,
	file: { bytes: Uint8Array; name: string; type?: string },
	kind = 'spec-sheet'
): Promise<{ status: number; json: any }> {
	const form = new FormData();
	form.set('kind', kind);
	form.set(
		'file',
		new Blob([new Uint8Array(file.bytes)], { type: file.type ?? 'application/pdf' }),
		file.name
	);
	const response = await fetch(`${BASE_URL}${modelPath}/attachments`, {
		method: 'POST',
		headers: { cookie: adminCookie, origin: BASE_URL, accept: 'application/json' },
		body: form
	});
	const text = await response.text();
	let json: unknown = text;
	try {
		json = JSON.parse(text);
	} catch {
		/* left as text: the caller's assertion names it */
	}
	return { status: response.status, json };
}

export async function makeInventoryFixtures(adminCookie: string): Promise<InventoryFixtures> {
	const ids = await makeFixtures(adminCookie);
	const upload = await uploadAttachment(adminCookie, `/api/loudspeakers/${ids.speakerId}`, {
		bytes: TINY_PDF,
		name: 'proof-sheet.pdf'
	});
	if (upload.status !== 201)
		throw new Error(`attachment fixture failed: ${upload.status} ${JSON.stringify(upload.json)}`);
	return { ...ids, attachmentId: upload.json.id as number };
}

async function created(
	result: Promise<{ status: number; json: any }>,
	what: string
): Promise<number> {
	const { status, json } = await result;
	if (status !== 201)
		throw new Error(`throwaway ${what} failed: ${status} ${JSON.stringify(json)}`);
	return json.id as number;
}

/** A new row of the kind, made by the admin; the caller may let a role delete it. */
export async function makeThrowaway(
	kind: ThrowawayKind,
	adminCookie: string,
	base: InventoryFixtures
): Promise<number> {
	const post = (path: string, body: unknown) =>
		api(path, { cookie: adminCookie, method: 'POST', body });
	switch (kind) {
		case 'loudspeaker':
			return created(
				post('/api/loudspeakers', loudspeakerBody({ name: `Proof throwaway cab ${tag()}` })),
				kind
			);
		case 'amplifier':
			return created(
				post('/api/amplifiers', amplifierBody({ name: `Proof throwaway amp ${tag()}` })),
				kind
			);
		case 'package':
			return created(
				post('/api/packages', {
					name: `Proof throwaway kit ${tag()}`,
					slug: `proof-throwaway-${tag()}`,
					groups: [
						{
							loudspeakerModelId: base.speakerId,
							amplifierModelId: base.ampId,
							count: 2,
							stacks: 2,
							cabinetsPerChannel: 1
						}
					]
				}),
				kind
			);
		case 'unit':
			return created(
				post('/api/stock-units', {
					serial: `PROOF-${tag()}`,
					modelType: 'loudspeaker',
					modelId: base.speakerId
				}),
				kind
			);
		case 'site':
			return created(post('/api/sites', { name: `Proof throwaway site ${tag()}`, receivers: [] }), kind);
		case 'attachment': {
			// Its own model: an upload replaces the model's earlier sheet, so the shared fixture's stays put.
			const model = await makeThrowaway('loudspeaker', adminCookie, base);
			return created(
				uploadAttachment(adminCookie, `/api/loudspeakers/${model}`, {
					bytes: TINY_PDF,
					name: 'throwaway.pdf'
				}),
				kind
			);
		}
	}
}

export async function rowExists(
	kind: ThrowawayKind,
	id: number,
	adminCookie: string
): Promise<boolean> {
	const { status } = await api(`${ROW_URL[kind]}/${id}`, { cookie: adminCookie });
	if (status !== 200 && status !== 404) throw new Error(`reading ${kind} ${id} answered ${status}`);
	return status === 200;
}

/** Removes what is left of the suite's throwaway rows (units and packages before the models they use). */
export async function removeThrowaways(
	rows: { kind: ThrowawayKind; id: number }[],
	adminCookie: string
): Promise<void> {
	const order: ThrowawayKind[] = ['site', 'attachment', 'unit', 'package', 'amplifier', 'loudspeaker'];
	for (const kind of order) {
		for (const row of rows.filter((r) => r.kind === kind)) {
			await api(`${ROW_URL[kind]}/${row.id}`, { cookie: adminCookie, method: 'DELETE' });
		}
	}
}

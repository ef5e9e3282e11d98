import { randomUUID } from 'node:crypto';
import { mkdir, readFile, rm, writeFile } from 'node:fs/promises';
import path from 'node:path';
import type { AttachmentRow } from '$lib/inventory/types';
import { ModelAttachment } from '../db/models';
import { DomainError } from './errors';
import { plainRow, specModelExists, withTransaction } from './inventory-common';
import { extensionFor, safeOriginalName, sniffMimeType, uploadProblem, type AttachmentKind } from './upload-checks';

type ModelType = 'loudspeaker' | 'amplifier';

/** Outside static/: files are served only through the signed-in route, never as public assets. */
export function uploadDir(): string {
	return path.resolve(process.env.UPLOAD_DIR || '.data/uploads');
}

/** Stored names are generated here and only ever match this shape, so no name can leave the folder. */
const STORED_NAME = /^[0-9a-f-]{36}\.(pdf|jpg|png|webp)$/;

function storedPath(storedName: string): string {
	if (!STORED_NAME.test(storedName)) throw new Error(`refusing an unexpected stored name: ${storedName}`);
	return path.join(uploadDir(), storedName);
}

function toRow(a: ModelAttachment): AttachmentRow {
	const { storedName: _stored, ...row } = plainRow<AttachmentRow & { storedName: string }>(a);
	return row;
}

export async function listAttachments(modelType: ModelType, modelId: number): Promise<AttachmentRow[]> {
	const rows = await ModelAttachment.findAll({ where: { modelType, modelId }, order: [['kind', 'ASC']] });
	return rows.map(toRow);
}

/**
 * Checks and stores a spec sheet or photo for a model, replacing the one it had of that kind.
 * Refusals (size, a type the bytes do not bear out, unknown model) are 422 / 404 DomainErrors.
 */
export async function saveAttachment(input: {
	modelType: ModelType;
	modelId: number;
	kind: AttachmentKind;
	originalName: string;
	bytes: Uint8Array;
	userId: number | null;
}): Promise<AttachmentRow> {
	if (!(await specModelExists(input.modelType, input.modelId))) throw new DomainError(404, `No such ${input.modelType} model.`);
	const problem = uploadProblem(input.kind, input.bytes);
	if (problem) throw new DomainError(422, problem, { file: [problem] });

	const mimeType = sniffMimeType(input.bytes)!;
	const storedName = await storeFile(input.bytes, mimeType);
	try {
		const { row, replaced } = await withTransaction(undefined, async (transaction) => {
			const where = { modelType: input.modelType, modelId: input.modelId, kind: input.kind };
			const previous = await ModelAttachment.findAll({ where, transaction });
			await ModelAttachment.destroy({ where, transaction });
			const created = await ModelAttachment.create(
				{ ...where, originalName: safeOriginalName(input.originalName), storedName, mimeType, sizeBytes: input.bytes.length, uploadedBy: input.userId },
				{ transaction }
			);
			return { row: toRow(created), replaced: previous.map((p) => p.storedName) };
		});
		await removeStoredFiles(replaced);
		return row;
	} catch (err) {
		await removeStoredFiles([storedName]);
		throw err;
	}
}

/** The attachment's row and bytes, for the serving route. */
export async function readAttachment(id: number): Promise<{ row: AttachmentRow; bytes: Buffer }> {
	const found = await ModelAttachment.findByPk(id);
	if (!found) throw new DomainError(404, 'No such attachment.');
	return { row: toRow(found), bytes: await readStoredFile(found.storedName) };
}

export async function deleteAttachment(id: number): Promise<AttachmentRow> {
	const found = await ModelAttachment.findByPk(id);
	if (!found) throw new DomainError(404, 'No such attachment.');
	await found.destroy();
	await removeStoredFiles([found.storedName]);
	return toRow(found);
}

/**
 * Keeps checked bytes (see upload-checks) under a new generated name and returns that name. Other
 * uploads (damage photos) store through here too, so where files live is decided in one place.
 */
export async function storeFile(bytes: Uint8Array, mimeType: string): Promise<string> {
	const storedName = `${randomUUID()}${extensionFor(mimeType)}`;
	await mkdir(uploadDir(), { recursive: true });
	await writeFile(storedPath(storedName), bytes, { flag: 'wx' });
	return storedName;
}

/** The bytes stored under a name from storeFile; a missing file is a 404. */
export async function readStoredFile(storedName: string): Promise<Buffer> {
	return readFile(storedPath(storedName)).catch(() => {
		throw new DomainError(404, 'The stored file is missing.');
	});
}

/** Best effort: a file left behind is harmless, a row without its file is reported as missing. */
export async function removeStoredFiles(storedNames: readonly string[]): Promise<void> {
	await Promise.all(storedNames.map((name) => rm(storedPath(name), { force: true }).catch(() => undefined)));
}

import { randomUUID } from 'node:crypto';
import type { AttachmentRow } from '$lib/inventory/types';
import { ModelAttachment } from '../db/models';
import { deleteStoredFiles, getStoredFile, putStoredFile } from '../storage/stored-files';
import { DomainError } from './errors';
import { plainRow, specModelExists, withTransaction } from './inventory-common';
import { extensionFor, safeOriginalName, sniffMimeType, uploadProblem, type AttachmentKind } from './upload-checks';
import type { ModelType } from '$lib/inventory/types';


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
	const storedName = `${randomUUID()}${extensionFor(mimeType)}`;
	// Row and bytes in one transaction (stored_files, shared by every process): both or neither.
	return withTransaction(undefined, async (transaction) => {
		const where = { modelType: input.modelType, modelId: input.modelId, kind: input.kind };
		const previous = await ModelAttachment.findAll({ where, transaction });
		await ModelAttachment.destroy({ where, transaction });
		await deleteStoredFiles(previous.map((p) => p.storedName), transaction);
		await putStoredFile(storedName, mimeType, input.bytes, transaction);
		const created = await ModelAttachment.create(
			{ ...where, originalName: safeOriginalName(input.originalName), storedName, mimeType, sizeBytes: input.bytes.length, uploadedBy: input.userId },
			{ transaction }
		);
		return toRow(created);
	});
}

/** The attachment's row and bytes, for the serving route. */
export async function readAttachment(id: number): Promise<{ row: AttachmentRow; bytes: Buffer }> {
	const found = await ModelAttachment.findByPk(id);
	if (!found) throw new DomainError(404, 'No such attachment.');
	const bytes = await getStoredFile(found.storedName);
	if (!bytes) throw new DomainError(404, 'The file of this attachment is missing.');
	return { row: toRow(found), bytes };
}

export async function deleteAttachment(id: number): Promise<AttachmentRow> {
	const found = await ModelAttachment.findByPk(id);
	if (!found) throw new DomainError(404, 'No such attachment.');
	await withTransaction(undefined, async (transaction) => {
		await found.destroy({ transaction });
		await deleteStoredFiles([found.storedName], transaction);
	});
	return toRow(found);
}

/**
 * Keeps checked bytes (see upload-checks) under a new generated name and returns that name. Other
 * uploads (damage photos, the letterhead logo) store through here too, so where files live
 * (MariaDB's stored_files, shared by every process) is decided in one place.
 */
export async function storeFile(bytes: Uint8Array, mimeType: string): Promise<string> {
	const storedName = `${randomUUID()}${extensionFor(mimeType)}`;
	await putStoredFile(storedName, mimeType, bytes);
	return storedName;
}

/** The bytes stored under a name from storeFile; a missing file is a 404. */
export async function readStoredFile(storedName: string): Promise<Buffer> {
	const bytes = await getStoredFile(storedName);
	if (!bytes) throw new DomainError(404, 'The stored file is missing.');
	return bytes;
}

export async function removeStoredFiles(storedNames: readonly string[]): Promise<void> {
	await deleteStoredFiles(storedNames);
}

import { QueryTypes } from 'sequelize';
import { describe, expect, it } from 'vitest';
import { useTestDatabase } from '../../../../tests/helpers/db';
import { loudspeakerInput } from '../../../../tests/helpers/inventory-inputs';
import { listAttachments, readAttachment, saveAttachment } from './inventory-attachments';
import { loudspeakers } from './inventory-loudspeakers';
import { safeOriginalName, sniffMimeType } from './upload-checks';

const sequelize = useTestDatabase();

/** The stored file behind an attachment, as the database holds it. */
async function storedFileOf(attachmentId: number) {
	const [row] = await sequelize.query<{ name: string; sizeBytes: number; bytes: Buffer }>(
		`SELECT f.name, f.sizeBytes, f.bytes FROM stored_files f
		   JOIN model_attachments a ON a.storedName = f.name WHERE a.id = :attachmentId`,
		{ type: QueryTypes.SELECT, replacements: { attachmentId } }
	);
	return row;
}

async function storedFileCount(): Promise<number> {
	const [row] = await sequelize.query<{ n: number }>('SELECT COUNT(*) AS n FROM stored_files', { type: QueryTypes.SELECT });
	return Number(row.n);
}

const pdf = (size = 2048) => Uint8Array.from({ length: size }, (_, i) => (i < 8 ? '%PDF-1.7'.charCodeAt(i) : 32));
const png = () => Uint8Array.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13]);
const elf = () => Uint8Array.from([0x7f, 0x45, 0x4c, 0x46, 2, 1, 1, 0]);
const webp = () => new Uint8Array([...'RIFF'].map((c) => c.charCodeAt(0)).concat([0, 0, 0, 0], [...'WEBPVP8 '].map((c) => c.charCodeAt(0))));

async function model() {
	return (await loudspeakers.create(loudspeakerInput(), null)).id;
}

describe('type by magic bytes', () => {
	it('knows PDF, JPEG, PNG and WebP by their first bytes, nothing else', () => {
		expect(sniffMimeType(pdf())).toBe('application/pdf');
		expect(sniffMimeType(Uint8Array.from([0xff, 0xd8, 0xff, 0xe0]))).toBe('image/jpeg');
		expect(sniffMimeType(png())).toBe('image/png');
		expect(sniffMimeType(webp())).toBe('image/webp');
		expect(sniffMimeType(elf())).toBeNull();
		expect(sniffMimeType(new TextEncoder().encode('<svg onload=alert(1)>'))).toBeNull();
	});
	it('keeps only a harmless display name', () => {
		expect(safeOriginalName('../../etc/passwd')).toBe('passwd');
		expect(safeOriginalName('..\\..\\windows\\evil".pdf')).toBe('evil.pdf');
		expect(safeOriginalName('...')).toBe('file');
	});
});

describe('uploading attachments', () => {
	it('stores a spec sheet under a generated name in the database and reads it back', async () => {
		const id = await model();
		const row = await saveAttachment({ modelType: 'loudspeaker', modelId: id, kind: 'spec-sheet', originalName: 'sheet.pdf', bytes: pdf(), userId: null });
		expect(row).toMatchObject({ kind: 'spec-sheet', mimeType: 'application/pdf', sizeBytes: 2048, originalName: 'sheet.pdf' });
		const stored = await storedFileOf(row.id);
		expect(stored.name).toMatch(/^[0-9a-f-]{36}\.pdf$/);
		expect(Number(stored.sizeBytes)).toBe(2048);
		const read = await readAttachment(row.id);
		expect(read.bytes.subarray(0, 5).toString()).toBe('%PDF-');
	});

	it('keeps a spec sheet of the full 10 MB byte for byte (the server takes packets that large)', async () => {
		const id = await model();
		const bytes = pdf(10 * 1024 * 1024);
		bytes[bytes.length - 1] = 0x0a;
		const row = await saveAttachment({ modelType: 'loudspeaker', modelId: id, kind: 'spec-sheet', originalName: 'full.pdf', bytes, userId: null });
		const read = await readAttachment(row.id);
		expect(read.bytes.equals(Buffer.from(bytes))).toBe(true);
	});

	it('refuses an oversize spec sheet (over 10 MB) and an oversize photo (over 5 MB)', async () => {
		const id = await model();
		await expect(saveAttachment({ modelType: 'loudspeaker', modelId: id, kind: 'spec-sheet', originalName: 'big.pdf', bytes: pdf(10 * 1024 * 1024 + 1), userId: null })).rejects.toMatchObject({ status: 422, errors: { file: [expect.stringMatching(/too large/)] } });
		const bigPhoto = new Uint8Array(5 * 1024 * 1024 + 1);
		bigPhoto.set(png());
		await expect(saveAttachment({ modelType: 'loudspeaker', modelId: id, kind: 'photo', originalName: 'big.png', bytes: bigPhoto, userId: null })).rejects.toMatchObject({ status: 422 });
	});

	it('refuses wrong magic bytes whatever the name: a renamed executable, a PNG as spec sheet', async () => {
		const id = await model();
		await expect(saveAttachment({ modelType: 'loudspeaker', modelId: id, kind: 'spec-sheet', originalName: 'sheet.pdf', bytes: elf(), userId: null })).rejects.toMatchObject({ status: 422 });
		await expect(saveAttachment({ modelType: 'loudspeaker', modelId: id, kind: 'photo', originalName: 'photo.jpg', bytes: elf(), userId: null })).rejects.toMatchObject({ status: 422 });
		await expect(saveAttachment({ modelType: 'loudspeaker', modelId: id, kind: 'spec-sheet', originalName: 'x.pdf', bytes: png(), userId: null })).rejects.toMatchObject({ status: 422 });
		expect(await listAttachments('loudspeaker', id)).toEqual([]);
	});

	it('a traversal name is stored harmlessly: only a generated name, the name kept for display', async () => {
		const id = await model();
		const before = await storedFileCount();
		const row = await saveAttachment({ modelType: 'loudspeaker', modelId: id, kind: 'photo', originalName: '../../../../tmp/evil.png', bytes: png(), userId: null });
		expect(row.originalName).toBe('evil.png');
		expect(await storedFileCount()).toBe(before + 1);
		const stored = await storedFileOf(row.id);
		expect(stored.name).toMatch(/^[0-9a-f-]{36}\.png$/);
		expect(stored.bytes).toHaveLength(12);
	});

	it('a second photo replaces the first; an unknown model is 404', async () => {
		const id = await model();
		await saveAttachment({ modelType: 'loudspeaker', modelId: id, kind: 'photo', originalName: 'a.png', bytes: png(), userId: null });
		await saveAttachment({ modelType: 'loudspeaker', modelId: id, kind: 'photo', originalName: 'b.webp', bytes: webp(), userId: null });
		const [kept] = await listAttachments('loudspeaker', id);
		expect(kept.originalName).toBe('b.webp');
		const [{ n }] = await sequelize.query<{ n: number }>(
			`SELECT COUNT(*) AS n FROM stored_files f WHERE f.name LIKE '%.png' AND NOT EXISTS (SELECT 1 FROM model_attachments a WHERE a.storedName = f.name)
			   AND NOT EXISTS (SELECT 1 FROM damage_reports d WHERE d.photoStoredName = f.name)
			   AND NOT EXISTS (SELECT 1 FROM company_settings c WHERE c.logoFile = f.name)`,
			{ type: QueryTypes.SELECT }
		);
		expect(Number(n), 'the replaced photo is gone with its row').toBe(0);
		await expect(saveAttachment({ modelType: 'amplifier', modelId: 999_999_999, kind: 'photo', originalName: 'a.png', bytes: png(), userId: null })).rejects.toMatchObject({ status: 404 });
	});
});

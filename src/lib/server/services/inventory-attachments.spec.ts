import { mkdtemp, readdir, readFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { useTestDatabase } from '../../../../tests/helpers/db';
import { loudspeakerInput } from '../../../../tests/helpers/inventory-inputs';
import { listAttachments, readAttachment, saveAttachment } from './inventory-attachments';
import { loudspeakers } from './inventory-loudspeakers';
import { safeOriginalName, sniffMimeType } from './upload-checks';

useTestDatabase();

let dir: string;
beforeAll(async () => {
	// Each run gets its own folder, so this file cannot touch another's files.
	dir = await mkdtemp(path.join(tmpdir(), 'throwline-uploads-'));
	process.env.UPLOAD_DIR = dir;
});

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
	it('stores a spec sheet under a generated name in UPLOAD_DIR and reads it back', async () => {
		const id = await model();
		const row = await saveAttachment({ modelType: 'loudspeaker', modelId: id, kind: 'spec-sheet', originalName: 'sheet.pdf', bytes: pdf(), userId: null });
		expect(row).toMatchObject({ kind: 'spec-sheet', mimeType: 'application/pdf', sizeBytes: 2048, originalName: 'sheet.pdf' });
		const stored = await readdir(dir);
		expect(stored.some((f) => /^[0-9a-f-]{36}\.pdf$/.test(f))).toBe(true);
		const read = await readAttachment(row.id);
		expect(read.bytes.subarray(0, 5).toString()).toBe('%PDF-');
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

	it('a traversal name is stored harmlessly: only a generated file inside UPLOAD_DIR, the name kept for display', async () => {
		const id = await model();
		const before = new Set(await readdir(dir));
		const row = await saveAttachment({ modelType: 'loudspeaker', modelId: id, kind: 'photo', originalName: '../../../../tmp/evil.png', bytes: png(), userId: null });
		expect(row.originalName).toBe('evil.png');
		const added = (await readdir(dir)).filter((f) => !before.has(f));
		expect(added).toHaveLength(1);
		expect(added[0]).toMatch(/^[0-9a-f-]{36}\.png$/);
		expect(await readFile(path.join(dir, added[0]))).toHaveLength(12);
	});

	it('a second photo replaces the first; an unknown model is 404', async () => {
		const id = await model();
		await saveAttachment({ modelType: 'loudspeaker', modelId: id, kind: 'photo', originalName: 'a.png', bytes: png(), userId: null });
		await saveAttachment({ modelType: 'loudspeaker', modelId: id, kind: 'photo', originalName: 'b.webp', bytes: webp(), userId: null });
		expect((await listAttachments('loudspeaker', id)).map((a) => a.originalName)).toEqual(['b.webp']);
		await expect(saveAttachment({ modelType: 'amplifier', modelId: 999_999_999, kind: 'photo', originalName: 'a.png', bytes: png(), userId: null })).rejects.toMatchObject({ status: 404 });
	});
});

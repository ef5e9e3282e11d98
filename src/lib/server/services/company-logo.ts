/** The company logo for the quote document's letterhead: checked like every upload, stored outside static/. */
import { randomUUID } from 'node:crypto';
import { mkdir, readFile, rm, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { DomainError } from './errors';
import { uploadDir } from './inventory-attachments';
import { getSettings, setLogoFile } from './settings';
import { extensionFor, sniffMimeType, uploadProblem } from './upload-checks';

const logoDir = () => path.join(uploadDir(), 'company');

export async function saveLogo(bytes: Uint8Array): Promise<void> {
	const problem = uploadProblem('logo', bytes);
	if (problem) throw new DomainError(422, problem, { logo: [problem] });
	const previous = (await getSettings()).logoFile;
	const name = `logo-${randomUUID()}${extensionFor(sniffMimeType(bytes)!)}`;
	await mkdir(logoDir(), { recursive: true });
	await writeFile(path.join(logoDir(), name), bytes);
	await setLogoFile(name);
	if (previous) await rm(path.join(logoDir(), path.basename(previous)), { force: true });
}

export async function removeLogo(): Promise<void> {
	const previous = (await getSettings()).logoFile;
	if (!previous) throw new DomainError(409, 'There is no logo to remove.');
	await setLogoFile(null);
	await rm(path.join(logoDir(), path.basename(previous)), { force: true });
}

/** The logo's bytes and type, or null when none is set or the file is gone. */
export async function readLogo(): Promise<{ bytes: Buffer; type: string } | null> {
	const file = (await getSettings()).logoFile;
	if (!file) return null;
	try {
		const bytes = await readFile(path.join(logoDir(), path.basename(file)));
		return { bytes, type: sniffMimeType(bytes) ?? 'application/octet-stream' };
	} catch {
		return null;
	}
}

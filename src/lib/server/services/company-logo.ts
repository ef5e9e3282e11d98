/**
 * The company logo for the quote document's letterhead: checked like every upload and kept with the
 * other stored files (in MariaDB, never under static/).
 */
import { DomainError } from './errors';
import { readStoredFile, removeStoredFiles, storeFile } from './inventory-attachments';
import { getSettings, setLogoFile } from './settings';
import { sniffMimeType, uploadProblem } from './upload-checks';

export async function saveLogo(bytes: Uint8Array): Promise<void> {
	const problem = uploadProblem('logo', bytes);
	if (problem) throw new DomainError(422, problem, { logo: [problem] });
	const previous = (await getSettings()).logoFile;
	const name = await storeFile(bytes, sniffMimeType(bytes)!);
	await setLogoFile(name);
	if (previous) await removeStoredFiles([previous]).catch(() => undefined);
}

export async function removeLogo(): Promise<void> {
	const previous = (await getSettings()).logoFile;
	if (!previous) throw new DomainError(409, 'There is no logo to remove.');
	await setLogoFile(null);
	await removeStoredFiles([previous]).catch(() => undefined);
}

/** The logo's bytes and type, or null when none is set or the file is gone. */
export async function readLogo(): Promise<{ bytes: Buffer; type: string } | null> {
	const file = (await getSettings()).logoFile;
	if (!file) return null;
	try {
		const bytes = await readStoredFile(file);
		return { bytes, type: sniffMimeType(bytes) ?? 'application/octet-stream' };
	} catch {
		return null;
	}
}

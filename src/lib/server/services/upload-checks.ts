/**
 * What an uploaded file really is, judged by its first bytes (never by its name or the browser's
 * word), and whether it may be stored as the given kind of attachment.
 */
export type AttachmentKind = 'spec-sheet' | 'photo';
/** Every kind of upload the app takes: model attachments and the company logo. */
export type UploadKind = AttachmentKind | 'logo';

export const UPLOAD_LIMITS: Record<UploadKind, { maxBytes: number; types: readonly string[]; label: string }> = {
	'spec-sheet': { maxBytes: 10 * 1024 * 1024, types: ['application/pdf'], label: 'a PDF of at most 10 MB' },
	photo: { maxBytes: 5 * 1024 * 1024, types: ['image/jpeg', 'image/png', 'image/webp'], label: 'a JPEG, PNG or WebP of at most 5 MB' },
	// The quote document's PDF library draws PNG and JPEG only.
	logo: { maxBytes: 1024 * 1024, types: ['image/jpeg', 'image/png'], label: 'a PNG or JPEG of at most 1 MB' }
};

const EXTENSIONS: Record<string, string> = {
	'application/pdf': '.pdf',
	'image/jpeg': '.jpg',
	'image/png': '.png',
	'image/webp': '.webp'
};

function startsWith(bytes: Uint8Array, signature: number[], offset = 0): boolean {
	return bytes.length >= offset + signature.length && signature.every((b, i) => bytes[offset + i] === b);
}

const ascii = (text: string) => [...text].map((c) => c.charCodeAt(0));

export function sniffMimeType(bytes: Uint8Array): string | null {
	if (startsWith(bytes, ascii('%PDF-'))) return 'application/pdf';
	if (startsWith(bytes, [0xff, 0xd8, 0xff])) return 'image/jpeg';
	if (startsWith(bytes, [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])) return 'image/png';
	if (startsWith(bytes, ascii('RIFF')) && startsWith(bytes, ascii('WEBP'), 8)) return 'image/webp';
	return null;
}

export function extensionFor(mimeType: string): string {
	return EXTENSIONS[mimeType] ?? '.bin';
}

/** The reason a file is refused, or null when it may be stored. */
export function uploadProblem(kind: UploadKind, bytes: Uint8Array): string | null {
	const limit = UPLOAD_LIMITS[kind];
	if (bytes.length === 0) return 'The file is empty.';
	if (bytes.length > limit.maxBytes) return `The file is too large: upload ${limit.label}.`;
	const type = sniffMimeType(bytes);
	if (!type || !limit.types.includes(type)) return `That file is not ${limit.label}, whatever its name says.`;
	return null;
}

/**
 * A display name that cannot name a path or break a header: the last path segment only, control
 * characters and quotes removed, at most 200 characters. It is only ever shown, never used to store.
 */
export function safeOriginalName(name: string): string {
	const lastSegment = name.split(/[\\/]/).pop() ?? '';
	const cleaned = lastSegment.replace(/[\u0000-\u001f\u007f"]/g, '').replace(/^\.+/, '').trim();
	return (cleaned || 'file').slice(0, 200);
}

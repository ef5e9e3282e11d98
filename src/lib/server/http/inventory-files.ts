import { error } from '@sveltejs/kit';
import type { AttachmentRow } from '$lib/inventory/types';
import { MAX_CSV_BYTES } from '../services/inventory-csv';
import { UPLOAD_LIMITS, type AttachmentKind } from '../services/upload-checks';

function tooLarge(request: Request, maxBytes: number): boolean {
	return Number(request.headers.get('content-length') ?? 0) > maxBytes;
}

/** The CSV text of an import: a multipart `file` field or a text/csv body, at most 1 MB. */
export async function readCsvBody(request: Request): Promise<string> {
	const type = (request.headers.get('content-type') ?? '').toLowerCase();
	// Multipart framing adds a little; the file itself is checked exactly below.
	if (tooLarge(request, MAX_CSV_BYTES + 16 * 1024)) error(413, { message: 'The file is larger than 1 MB.' });
	let text: string;
	if (type.startsWith('multipart/form-data')) {
		const file = (await request.formData().catch(() => error(400, { message: 'The upload could not be read.' }))).get('file');
		if (!(file instanceof File)) error(400, { message: 'Attach the CSV file as the "file" field.' });
		if (file.size > MAX_CSV_BYTES) error(413, { message: 'The file is larger than 1 MB.' });
		text = await file.text();
	} else if (type.startsWith('text/csv') || type.startsWith('text/plain')) {
		text = await request.text();
	} else {
		error(400, { message: 'Send a CSV file (multipart "file" field) or a text/csv body.' });
	}
	if (new TextEncoder().encode(text).length > MAX_CSV_BYTES) error(413, { message: 'The file is larger than 1 MB.' });
	return text;
}

/** A spec-sheet or photo upload: multipart with `kind` and `file`. The bytes are judged by the service. */
export async function readAttachmentUpload(request: Request): Promise<{ kind: AttachmentKind; name: string; bytes: Uint8Array }> {
	if (!(request.headers.get('content-type') ?? '').toLowerCase().startsWith('multipart/form-data')) {
		error(400, { message: 'Send the file as multipart/form-data.' });
	}
	if (tooLarge(request, UPLOAD_LIMITS['spec-sheet'].maxBytes + 64 * 1024)) error(413, { message: 'The file is larger than 10 MB.' });
	const form = await request.formData().catch(() => error(400, { message: 'The upload could not be read.' }));
	const kind = form.get('kind');
	const file = form.get('file');
	if (kind !== 'spec-sheet' && kind !== 'photo') {
		error(422, { message: 'Some fields need attention.', errors: { kind: ['Choose spec sheet or photo'] } });
	}
	if (!(file instanceof File)) error(422, { message: 'Some fields need attention.', errors: { file: ['Choose a file'] } });
	return { kind, name: file.name, bytes: new Uint8Array(await file.arrayBuffer()) };
}

/** `content-disposition` with a plain ASCII fallback name and the exact UTF-8 name (RFC 6266 / 5987). */
export function contentDisposition(disposition: 'inline' | 'attachment', name: string): string {
	const fallback = name.replace(/[^A-Za-z0-9._ -]/g, '_') || 'file';
	return `${disposition}; filename="${fallback}"; filename*=UTF-8''${encodeURIComponent(name)}`;
}

export function attachmentResponse(row: AttachmentRow, bytes: Buffer): Response {
	return new Response(new Uint8Array(bytes), {
		headers: {
			'content-type': row.mimeType,
			'content-length': String(bytes.length),
			// A PDF passes the magic-byte check even when it is also an HTML page (a polyglot), so spec
			// sheets are downloaded, never rendered as a page of ours; photos show inline but sandboxed.
			'content-disposition': contentDisposition(row.mimeType === 'application/pdf' ? 'attachment' : 'inline', row.originalName),
			'cache-control': 'private, no-store',
			'x-content-type-options': 'nosniff',
			'content-security-policy': "default-src 'none'; img-src 'self'; sandbox"
		}
	});
}

export function csvResponse(text: string, filename: string): Response {
	return new Response(text, {
		headers: {
			'content-type': 'text/csv; charset=utf-8',
			'content-disposition': contentDisposition('attachment', filename),
			'cache-control': 'private, no-store'
		}
	});
}

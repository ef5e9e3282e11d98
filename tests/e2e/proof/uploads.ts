/**
 * Hostile spec-sheet and photo uploads, as raw multipart bodies (so broken framing can be sent too):
 * oversize files, the wrong type, executables renamed to .pdf, path-traversal file names.
 */
import fc from 'fast-check';

export interface HostileUpload {
	label: string;
	kind?: string;
	file?: { name: string; bytes: Buffer; type?: string };
	/** The file sent as a plain text field instead of a file. */
	fileAsText?: boolean;
	/** Sent as is, instead of a well-formed multipart body. */
	raw?: { contentType: string | null; bytes: Buffer };
	expected: number[];
	/** Over a size limit: the server may answer before reading it (see hostile-input.e2e.ts). */
	oversize: boolean;
}

const MB = 1024 * 1024;
const BOUNDARY = '----proof-suite-boundary';

const PDF = Buffer.from('%PDF-1.4\n');
const JPEG = Buffer.from([0xff, 0xd8, 0xff, 0xe0]);
const PNG = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
const WINDOWS_EXE = Buffer.concat([
	Buffer.from('MZ'),
	Buffer.alloc(126),
	Buffer.from('PE\0\0This program cannot be run in DOS mode.')
]);
const ELF = Buffer.concat([Buffer.from([0x7f, 0x45, 0x4c, 0x46, 2, 1, 1, 0]), Buffer.alloc(56)]);

export const TRAVERSAL_NAMES = [
	'../../etc/passwd.pdf',
	'..\\..\\windows\\system32\\drivers\\etc\\hosts.pdf',
	'/etc/passwd',
	'%2e%2e%2f%2e%2e%2fpasswd.pdf',
	'....//....//passwd.pdf',
	'sheet.pdf\u0000.exe',
	'.htaccess',
	'CON.pdf',
	'"quoted"; name="kind".pdf'
];

const padded = (head: Buffer, size: number) =>
	Buffer.concat([head, Buffer.alloc(Math.max(0, size - head.length), 0x20)]);

/** Filenames in a multipart header: quotes and line breaks escaped as browsers do. */
const headerName = (name: string) =>
	name.replace(/"/g, '%22').replace(/\r/g, '%0D').replace(/\n/g, '%0A');

export function multipartBody(u: HostileUpload): { contentType: string | null; bytes: Buffer } {
	if (u.raw) return u.raw;
	const parts: Buffer[] = [];
	if (u.kind !== undefined)
		parts.push(
			Buffer.from(
				`--${BOUNDARY}\r\nContent-Disposition: form-data; name="kind"\r\n\r\n${u.kind}\r\n`
			)
		);
	if (u.file && u.fileAsText) {
		parts.push(
			Buffer.from(`--${BOUNDARY}\r\nContent-Disposition: form-data; name="file"\r\n\r\n`),
			u.file.bytes,
			Buffer.from('\r\n')
		);
	} else if (u.file) {
		const head = `--${BOUNDARY}\r\nContent-Disposition: form-data; name="file"; filename="${headerName(u.file.name)}"\r\nContent-Type: ${u.file.type ?? 'application/pdf'}\r\n\r\n`;
		parts.push(Buffer.from(head), u.file.bytes, Buffer.from('\r\n'));
	}
	parts.push(Buffer.from(`--${BOUNDARY}--\r\n`));
	return { contentType: `multipart/form-data; boundary=${BOUNDARY}`, bytes: Buffer.concat(parts) };
}

function fixed(): HostileUpload[] {
	const sheet = (
		label: string,
		name: string,
		bytes: Buffer,
		expected = [422],
		kind = 'spec-sheet'
	): HostileUpload => ({ label, kind, file: { name, bytes }, expected, oversize: false });
	return [
		sheet('a spec sheet 1 byte over 10 MB', 'big.pdf', padded(PDF, 10 * MB + 1)),
		{
			...sheet(
				'a body over the upload limit (10.5 MB)',
				'bigger.pdf',
				padded(PDF, 10.5 * MB),
				[413]
			),
			oversize: true
		},
		{
			...sheet('a body over the server limit (12 MB)', 'huge.pdf', padded(PDF, 12 * MB), [413]),
			oversize: true
		},
		sheet('a photo 1 byte over 5 MB', 'big.jpg', padded(JPEG, 5 * MB + 1), [422], 'photo'),
		sheet('plain text named .pdf', 'notes.pdf', Buffer.from('just some text, not a PDF')),
		sheet('a PNG as a spec sheet', 'image.pdf', padded(PNG, 200)),
		sheet('a PDF as a photo', 'photo.jpg', padded(PDF, 200), [422], 'photo'),
		sheet('a Windows executable renamed .pdf', 'spec-sheet.pdf', WINDOWS_EXE),
		sheet('an ELF binary renamed .pdf', 'spec-sheet.pdf', ELF),
		sheet('a shell script renamed .pdf', 'run.pdf', Buffer.from('#!/bin/sh\nrm -rf /\n')),
		sheet('HTML renamed .pdf', 'page.pdf', Buffer.from('<html><script>alert(1)</script></html>')),
		sheet(
			'SVG with a script as a photo',
			'logo.png',
			Buffer.from('<svg xmlns="http://www.w3.org/2000/svg" onload="alert(1)"/>'),
			[422],
			'photo'
		),
		sheet(
			'PDF bytes after a junk byte',
			'late.pdf',
			Buffer.concat([Buffer.from('X'), padded(PDF, 100)])
		),
		sheet('an empty file', 'empty.pdf', Buffer.alloc(0)),
		...TRAVERSAL_NAMES.map((name) =>
			sheet(`an executable named ${JSON.stringify(name)}`, name, WINDOWS_EXE)
		),
		{
			label: 'no kind',
			file: { name: 'a.pdf', bytes: padded(PDF, 100) },
			expected: [422],
			oversize: false
		},
		sheet('an unknown kind', 'a.pdf', padded(PDF, 100), [422], 'executable'),
		{
			label: 'the file as a text field',
			kind: 'spec-sheet',
			file: { name: 'a.pdf', bytes: padded(PDF, 100) },
			fileAsText: true,
			expected: [422],
			oversize: false
		},
		{
			label: 'multipart without a boundary',
			raw: { contentType: 'multipart/form-data', bytes: padded(PDF, 100) },
			expected: [400],
			oversize: false
		},
		{
			label: 'multipart that never ends',
			raw: {
				contentType: `multipart/form-data; boundary=${BOUNDARY}`,
				bytes: Buffer.from(
					`--${BOUNDARY}\r\nContent-Disposition: form-data; name="file"; filename="a.pdf"\r\n\r\n%PDF-`
				)
			},
			expected: [400],
			oversize: false
		},
		{
			label: 'a PDF sent as JSON',
			raw: { contentType: 'application/json', bytes: padded(PDF, 100) },
			expected: [400],
			oversize: false
		},
		{
			label: 'no content type',
			raw: { contentType: null, bytes: padded(PDF, 100) },
			expected: [400],
			oversize: false
		}
	];
}

/** Random names (traversal ones among them) × bytes no check accepts (never starting with a known magic) × odd kinds. */
const arbitrary: fc.Arbitrary<HostileUpload> = fc
	.record({
		name: fc.oneof(
			fc.constantFrom(...TRAVERSAL_NAMES),
			fc.string({ maxLength: 40 }).map((s) => `${s}.pdf`)
		),
		bytes: fc
			.uint8Array({ maxLength: 4096 })
			.map((b) => Buffer.concat([Buffer.from('!'), Buffer.from(b)])),
		kind: fc.constantFrom('spec-sheet', 'photo', '', 'SPEC-SHEET', 'spec-sheet\u0000', '../photo'),
		type: fc.constantFrom('application/pdf', 'image/png', 'application/x-msdownload', 'text/html')
	})
	.map(({ name, bytes, kind, type }) => ({
		label: `${bytes.length} junk bytes named ${JSON.stringify(name)} as ${JSON.stringify(kind)}`,
		kind,
		file: { name, bytes, type },
		expected: [422],
		oversize: false
	}));

export const hostileUploads = { fixed, arbitrary };

// Stores each received message as an .eml file plus a sidecar .json with the parsed fields, so tests
// and the inbox page read messages without parsing MIME themselves. One file pair per message (rather
// than one shared index) means concurrent deliveries never race on a single file.
import { randomBytes } from 'node:crypto';
import { mkdir, readdir, readFile, rename, rm, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { simpleParser, type AddressObject } from 'mailparser';

export interface StoredMessage {
	id: string;
	file: string;
	receivedAt: string;
	envelope: { from: string | null; to: string[] };
	from: string;
	to: string[];
	cc: string[];
	subject: string;
	date: string | null;
	text: string;
	html: string | null;
	attachments: { filename: string | null; contentType: string; size: number }[];
}

const ID_PATTERN = /^[0-9TZ.-]+-[0-9a-f]{12}$/;

export function isMessageId(id: string): boolean {
	return ID_PATTERN.test(id);
}

function addresses(field: AddressObject | AddressObject[] | undefined): string[] {
	const list = Array.isArray(field) ? field : field ? [field] : [];
	return list.flatMap((a) => a.value.map((v) => (v.address ?? '').toLowerCase())).filter(Boolean);
}

export class MailStore {
	constructor(readonly dir: string) {}

	async init(): Promise<void> {
		await mkdir(this.dir, { recursive: true });
	}

	/** Saves the raw message and its parsed sidecar; the .json is written last (atomically) so readers never see half a message. */
	async save(raw: Buffer, envelope: { from: string | null; to: string[] }): Promise<StoredMessage> {
		const now = new Date();
		// Colons are swapped for dashes: the id doubles as a file name and a URL segment.
		const id = `${now.toISOString().replace(/:/g, '-')}-${randomBytes(6).toString('hex')}`;
		const file = `${id}.eml`;
		await writeFile(join(this.dir, file), raw);
		const parsed = await simpleParser(raw);
		const message: StoredMessage = {
			id,
			file,
			receivedAt: now.toISOString(),
			envelope: { from: envelope.from, to: envelope.to.map((a) => a.toLowerCase()) },
			from: parsed.from?.text ?? '',
			to: addresses(parsed.to),
			cc: addresses(parsed.cc),
			subject: parsed.subject ?? '',
			date: parsed.date ? parsed.date.toISOString() : null,
			text: parsed.text ?? '',
			html: typeof parsed.html === 'string' ? parsed.html : null,
			attachments: parsed.attachments.map((a) => ({
				filename: a.filename ?? null,
				contentType: a.contentType,
				size: a.size
			}))
		};
		const tmp = join(this.dir, `.${id}.json.tmp`);
		await writeFile(tmp, JSON.stringify(message, null, 2));
		await rename(tmp, join(this.dir, `${id}.json`));
		return message;
	}

	/** Newest first; `to` matches the envelope recipients and the To/Cc headers, case-insensitively. */
	async list(filter: { to?: string; subject?: string } = {}): Promise<StoredMessage[]> {
		const names = await this.sidecars();
		const messages: StoredMessage[] = [];
		for (const name of names) {
			try {
				messages.push(JSON.parse(await readFile(join(this.dir, name), 'utf8')) as StoredMessage);
			} catch {
				// removed by a concurrent clear; skip it
			}
		}
		const to = filter.to?.toLowerCase();
		const subject = filter.subject?.toLowerCase();
		return messages
			.filter((m) => !to || [...m.envelope.to, ...m.to, ...m.cc].includes(to))
			.filter((m) => !subject || m.subject.toLowerCase().includes(subject))
			.sort((a, b) => (a.id < b.id ? 1 : a.id > b.id ? -1 : 0));
	}

	async get(id: string): Promise<StoredMessage | null> {
		if (!isMessageId(id)) return null;
		try {
			return JSON.parse(await readFile(join(this.dir, `${id}.json`), 'utf8')) as StoredMessage;
		} catch {
			return null;
		}
	}

	async raw(id: string): Promise<Buffer | null> {
		if (!isMessageId(id)) return null;
		return readFile(join(this.dir, `${id}.eml`)).catch(() => null);
	}

	/** Removes only the files this store wrote (message .eml/.json pairs), never anything else in the folder. */
	async clear(): Promise<number> {
		const names = await readdir(this.dir).catch(() => [] as string[]);
		let removed = 0;
		for (const name of names) {
			const id = name.replace(/\.(eml|json)$/, '');
			if (id === name || !isMessageId(id)) continue;
			await rm(join(this.dir, name), { force: true });
			if (name.endsWith('.json')) removed += 1;
		}
		return removed;
	}

	private async sidecars(): Promise<string[]> {
		const names = await readdir(this.dir).catch(() => [] as string[]);
		return names.filter((n) => n.endsWith('.json') && isMessageId(n.slice(0, -5)));
	}
}

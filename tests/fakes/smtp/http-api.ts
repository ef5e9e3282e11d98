// Read API over the stored mail, so tests poll for messages instead of parsing files, plus a bare
// HTML inbox for a developer clicking through the demo.
import { createServer, type IncomingMessage, type Server, type ServerResponse } from 'node:http';
import type { MailStore, StoredMessage } from './mail-store';

function sendJson(res: ServerResponse, status: number, body: unknown): void {
	res.writeHead(status, {
		'content-type': 'application/json; charset=utf-8',
		'cache-control': 'no-store'
	});
	res.end(JSON.stringify(body));
}

function escapeHtml(s: string): string {
	return s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

function inboxPage(messages: StoredMessage[]): string {
	const rows = messages
		.map(
			(m) => `<tr><td>${escapeHtml(m.receivedAt)}</td><td>${escapeHtml(m.to.join(', '))}</td>
<td>${escapeHtml(m.subject)}</td><td><a href="/messages/${m.id}/html">html</a> · <a href="/messages/${m.id}/text">text</a> · <a href="/messages/${m.id}/raw">.eml</a></td></tr>`
		)
		.join('\n');
	return `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>Local mail sink</title>
<style>body{font:14px system-ui,sans-serif;margin:2rem}table{border-collapse:collapse}td,th{padding:.3rem .6rem;border-bottom:1px solid #ddd;text-align:left}</style>
</head><body><h1>Local mail sink</h1><p>Messages caught by the development SMTP sink (nothing here was really sent), newest first.</p>
<table><thead><tr><th>received</th><th>to</th><th>subject</th><th>view</th></tr></thead><tbody>${rows || '<tr><td colspan="4">No messages.</td></tr>'}</tbody></table></body></html>`;
}

async function handle(store: MailStore, req: IncomingMessage, res: ServerResponse): Promise<void> {
	const url = new URL(req.url ?? '/', 'http://localhost');
	const parts = url.pathname.split('/').filter(Boolean);
	if (req.method === 'GET' && parts.length === 0) {
		res.writeHead(200, { 'content-type': 'text/html; charset=utf-8' });
		res.end(inboxPage(await store.list()));
		return;
	}
	if (parts[0] === 'health' && req.method === 'GET') return sendJson(res, 200, { ok: true });
	if (parts[0] !== 'messages') return sendJson(res, 404, { message: 'Not found' });

	if (parts.length === 1 && req.method === 'GET') {
		const to = url.searchParams.get('to') ?? undefined;
		const subject = url.searchParams.get('subject') ?? undefined;
		return sendJson(res, 200, await store.list({ to, subject }));
	}
	if (parts.length === 1 && req.method === 'DELETE') {
		return sendJson(res, 200, { deleted: await store.clear() });
	}
	if (parts.length >= 2 && req.method === 'GET') {
		const message = await store.get(parts[1]);
		if (!message) return sendJson(res, 404, { message: 'No such message' });
		const view = parts[2];
		if (!view) return sendJson(res, 200, message);
		if (view === 'raw') {
			res.writeHead(200, { 'content-type': 'message/rfc822' });
			res.end(await store.raw(message.id));
			return;
		}
		if (view === 'text') {
			res.writeHead(200, { 'content-type': 'text/plain; charset=utf-8' });
			res.end(message.text);
			return;
		}
		if (view === 'html') {
			// The mail's own HTML, sandboxed: no scripts, no same-origin access.
			res.writeHead(200, {
				'content-type': 'text/html; charset=utf-8',
				'content-security-policy':
					"sandbox; default-src 'none'; img-src data:; style-src 'unsafe-inline'"
			});
			res.end(message.html ?? `<pre>${escapeHtml(message.text)}</pre>`);
			return;
		}
	}
	sendJson(res, 405, { message: 'Method not allowed' });
}

export function createMailHttpApi(store: MailStore): Server {
	return createServer((req, res) => {
		handle(store, req, res).catch((err: unknown) => {
			sendJson(res, 500, { message: err instanceof Error ? err.message : String(err) });
		});
	});
}

// Test helper: waits for a message to reach the SMTP sink, by polling its HTTP read API.
import type { StoredMessage } from './smtp/mail-store';

export type { StoredMessage };

export interface MailQuery {
	to?: string;
	subjectIncludes?: string;
	/** Only messages received after this instant (ISO string or Date), e.g. when the test step began. */
	since?: string | Date;
	timeoutMs?: number;
	/** Defaults to http://127.0.0.1:$SMTP_HTTP_PORT (2580). */
	baseUrl?: string;
}

export function mailApiUrl(): string {
	return `http://127.0.0.1:${process.env.SMTP_HTTP_PORT ?? 2580}`;
}

export async function listMail(
	query: { to?: string; baseUrl?: string } = {}
): Promise<StoredMessage[]> {
	const url = new URL('/messages', query.baseUrl ?? mailApiUrl());
	if (query.to) url.searchParams.set('to', query.to);
	const res = await fetch(url);
	if (!res.ok) throw new Error(`mail sink answered ${res.status}`);
	return (await res.json()) as StoredMessage[];
}

export async function clearMail(baseUrl = mailApiUrl()): Promise<void> {
	const res = await fetch(new URL('/messages', baseUrl), { method: 'DELETE' });
	if (!res.ok) throw new Error(`mail sink answered ${res.status}`);
}

/** Resolves with the newest matching message, or rejects after timeoutMs (default 5 s) naming what it waited for. */
export async function waitForMail(query: MailQuery): Promise<StoredMessage> {
	const deadline = Date.now() + (query.timeoutMs ?? 5000);
	const since = query.since ? new Date(query.since).toISOString() : null;
	const needle = query.subjectIncludes?.toLowerCase();
	for (;;) {
		const messages = await listMail({ to: query.to, baseUrl: query.baseUrl }).catch(() => []);
		const hit = messages.find(
			(m) =>
				(!needle || m.subject.toLowerCase().includes(needle)) && (!since || m.receivedAt >= since)
		);
		if (hit) return hit;
		if (Date.now() > deadline) {
			throw new Error(
				`no mail${query.to ? ` to ${query.to}` : ''}${needle ? ` with subject containing "${query.subjectIncludes}"` : ''} within ${query.timeoutMs ?? 5000} ms`
			);
		}
		await new Promise((r) => setTimeout(r, 100));
	}
}

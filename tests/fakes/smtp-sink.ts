// Local SMTP sink: accepts every message on loopback (no TLS, any or no login), keeps it under mailDir
// as .eml + parsed .json, and serves a small HTTP read API that tests poll (see mailbox.ts).
import type { AddressInfo } from 'node:net';
import type { Server } from 'node:http';
import { SMTPServer } from 'smtp-server';
import { MailStore } from './smtp/mail-store';
import { createMailHttpApi } from './smtp/http-api';

export interface SmtpSinkOptions {
	host?: string;
	/** SMTP port; 0 picks a free one. */
	port?: number;
	/** HTTP read API port; 0 picks a free one. */
	httpPort?: number;
	mailDir: string;
	/** Largest message accepted, in bytes. */
	maxBytes?: number;
}

export interface SmtpSink {
	host: string;
	smtpPort: number;
	httpPort: number;
	httpUrl: string;
	store: MailStore;
	close(): Promise<void>;
}

function listen(
	server: {
		listen(port: number, host: string, cb: () => void): unknown;
		once(e: 'error', cb: (err: Error) => void): unknown;
	},
	port: number,
	host: string
): Promise<void> {
	return new Promise((resolve, reject) => {
		server.once('error', reject);
		server.listen(port, host, () => resolve());
	});
}

export async function startSmtpSink(options: SmtpSinkOptions): Promise<SmtpSink> {
	const host = options.host ?? '127.0.0.1';
	const maxBytes = options.maxBytes ?? 10 * 1024 * 1024;
	const store = new MailStore(options.mailDir);
	await store.init();

	const smtp = new SMTPServer({
		secure: false,
		disabledCommands: ['STARTTLS'],
		// Credentials are optional and never checked: the app may be configured with or without a login.
		authOptional: true,
		allowInsecureAuth: true,
		onAuth: (auth, _session, callback) => callback(null, { user: auth.username ?? 'anonymous' }),
		size: maxBytes,
		logger: false,
		banner: 'Throwline local SMTP sink (test stand-in, nothing is delivered)',
		onData(stream, session, callback) {
			const chunks: Buffer[] = [];
			stream.on('data', (chunk: Buffer) => chunks.push(chunk));
			stream.on('end', () => {
				if (stream.sizeExceeded) {
					const err = Object.assign(new Error('Message exceeds the fixed maximum message size'), {
						responseCode: 552
					});
					callback(err);
					return;
				}
				const mailFrom = session.envelope.mailFrom;
				store
					.save(Buffer.concat(chunks), {
						from: mailFrom ? mailFrom.address : null,
						to: session.envelope.rcptTo.map((r) => r.address)
					})
					.then((m) => callback(null, `Stored as ${m.id}`))
					.catch((err: Error) => callback(err));
			});
		}
	});
	smtp.on('error', (err) => console.error('[smtp-sink] smtp error:', err.message));

	const http: Server = createMailHttpApi(store);
	await listen(smtp.server, options.port ?? 2525, host);
	await listen(http, options.httpPort ?? 2580, host);
	const smtpPort = (smtp.server.address() as AddressInfo).port;
	const httpPort = (http.address() as AddressInfo).port;

	return {
		host,
		smtpPort,
		httpPort,
		httpUrl: `http://${host}:${httpPort}`,
		store,
		async close() {
			await new Promise<void>((resolve) => smtp.close(() => resolve()));
			http.closeAllConnections();
			await new Promise<void>((resolve) => http.close(() => resolve()));
		}
	};
}

/**
 * A request with exactly the bytes and headers given, on its own connection. fetch() would reuse a
 * keep-alive socket, and a server that refuses an oversize upload early (413 before reading it)
 * closes that socket: the reset would then land on whichever request came next.
 */
import http from 'node:http';
import { BASE_URL } from '../browser';

export interface RawAnswer {
	status: number;
	contentType: string;
	text: string;
	/** Set when the connection was reset before any answer arrived (e.g. while still uploading). */
	reset?: string;
}

export function rawRequest(
	method: string,
	path: string,
	headers: Record<string, string>,
	body?: Buffer,
	timeoutMs = 20_000
): Promise<RawAnswer> {
	const url = new URL(path, BASE_URL);
	return new Promise((resolve) => {
		let answered = false;
		const request = http.request(
			{
				method,
				hostname: url.hostname,
				port: url.port,
				path: url.pathname + url.search,
				agent: false,
				timeout: timeoutMs,
				headers: {
					connection: 'close',
					...(body ? { 'content-length': String(body.length) } : {}),
					...headers
				}
			},
			(response) => {
				answered = true;
				const chunks: Buffer[] = [];
				response.on('data', (c: Buffer) => chunks.push(c));
				response.on('end', () =>
					resolve({
						status: response.statusCode ?? 0,
						contentType: String(response.headers['content-type'] ?? ''),
						text: Buffer.concat(chunks).toString('utf8')
					})
				);
				response.on('error', (err) =>
					resolve({
						status: response.statusCode ?? 0,
						contentType: '',
						text: '',
						reset: String((err as NodeJS.ErrnoException).code ?? err.message)
					})
				);
			}
		);
		request.on('timeout', () => request.destroy(new Error('timed out')));
		request.on('error', (err) => {
			if (!answered)
				resolve({
					status: 0,
					contentType: '',
					text: '',
					reset: String((err as NodeJS.ErrnoException).code ?? err.message)
				});
		});
		if (body) request.end(body);
		else request.end();
	});
}

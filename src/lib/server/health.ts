import { ConnectionError, QueryTypes } from 'sequelize';
import { db } from './db';

const TIMEOUT_MS = 2000;

/** True when the database answers a trivial query within two seconds. */
export async function databaseAnswers(): Promise<boolean> {
	let timer: ReturnType<typeof setTimeout> | undefined;
	const timeout = new Promise<false>((resolve) => (timer = setTimeout(() => resolve(false), TIMEOUT_MS)));
	const query = db()
		.query('SELECT 1', { type: QueryTypes.SELECT }) // a typed query: raw ones trip over the connector's locked `meta`
		.then(() => true)
		.catch(() => false);
	try {
		return await Promise.race([query, timeout]);
	} finally {
		clearTimeout(timer);
	}
}

/** True when an error, or one it wraps (Auth.js keeps the original in `cause.err`), is a lost database connection. */
export function isDatabaseDown(err: unknown): boolean {
	let current = err;
	for (let depth = 0; current && depth < 5; depth++) {
		if (current instanceof ConnectionError) return true;
		const cause = (current as { cause?: unknown }).cause;
		current = (cause as { err?: unknown } | undefined)?.err ?? cause;
	}
	return false;
}

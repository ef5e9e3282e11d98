import { QueryTypes } from 'sequelize';
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

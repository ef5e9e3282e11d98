/**
 * Breaking and mending the fault world's services: its MariaDB (scripts/db.sh), its SMTP sink
 * (by the pid scripts/fakes.sh recorded) and its Stripe stand-in (the /_fake controls). Also a
 * direct database session, for checks the API does not show and for holding a row lock.
 */
import { readFileSync } from 'node:fs';
import * as mariadb from 'mariadb';
import { must } from '../bench/proc';
import { timedFetch } from './http';
import { world } from './world-info';

const seconds = (started: number) => Number(((performance.now() - started) / 1000).toFixed(2));

/** Runs one of our scripts with the world's environment; answers how long it took in seconds. */
async function script(args: string[], timeoutMs = 60_000): Promise<number> {
	const started = performance.now();
	await must('bash', args, world().env, timeoutMs);
	return seconds(started);
}

export const stopDatabase = () => script(['scripts/db.sh', 'stop']);
export const startDatabase = () => script(['scripts/db.sh', 'start']);

async function sinkAnswers(): Promise<boolean> {
	return timedFetch(`${world().mailApi}/health`, {}, 1000).then(
		(a) => a.status === 200,
		() => false
	);
}

/** Ends only the SMTP sink (its own pid), and waits until it no longer answers. */
export async function stopMailSink(): Promise<void> {
	const pid = Number(readFileSync(`${world().env.RUN_DIR}/smtp-sink.pid`, 'utf8'));
	process.kill(pid, 'SIGTERM');
	for (let i = 0; i < 50 && (await sinkAnswers()); i++)
		await new Promise((r) => setTimeout(r, 100));
	if (await sinkAnswers()) throw new Error('the SMTP sink still answers after SIGTERM');
}

/** fakes.sh starts whatever is not running: here only the sink. */
export async function startMailSink(): Promise<void> {
	await script(['scripts/fakes.sh', 'start']);
	for (let i = 0; i < 100 && !(await sinkAnswers()); i++)
		await new Promise((r) => setTimeout(r, 100));
	if (!(await sinkAnswers())) throw new Error('the SMTP sink did not come back');
}

/** POST /_fake/config on the stand-in: { failNext, delayMs, ... }. */
export async function stripeFaults(config: Record<string, unknown>): Promise<void> {
	const answer = await timedFetch(`${world().stripeApi}/_fake/config`, {
		method: 'POST',
		headers: { 'content-type': 'application/json' },
		body: JSON.stringify(config)
	});
	if (answer.status !== 200)
		throw new Error(`/_fake/config answered ${answer.status}: ${answer.text}`);
}

/** A connection straight to the world's database (not through the app). */
export function databaseSession(): Promise<mariadb.Connection> {
	const env = world().env;
	return mariadb.createConnection({
		host: env.DATABASE_HOST,
		port: Number(env.DATABASE_PORT),
		user: env.DATABASE_USER,
		password: env.DATABASE_PASSWORD,
		database: env.DATABASE_NAME,
		connectTimeout: 3000
	});
}

/** One number from the world's database, e.g. a count. */
export async function scalar(sql: string, values: unknown[]): Promise<number> {
	const conn = await databaseSession();
	try {
		const rows = (await conn.query({ sql, rowsAsArray: true }, values)) as unknown[][];
		return Number(rows[0]?.[0]);
	} finally {
		await conn.end();
	}
}

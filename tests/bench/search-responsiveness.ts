/**
 * Does a suggestion search hold up the app? Against a running app (the bench world, or the test
 * world: `bash scripts/test-world.sh up`): `/api/health` p95 at 20 requests a second, first idle,
 * then while one 40-model search runs (its worker thread, src/lib/server/search); and the time
 * POST /api/suggestions takes on the demo catalogue and on 40 models. The 40 models are clones of
 * the demo's with units of their own, added for the measurement and removed after it.
 *   . scripts/test-env.sh && npx tsx tests/bench/search-responsiveness.ts
 */
import http from 'node:http';
import { pathToFileURL } from 'node:url';
import { QueryTypes, type Sequelize } from 'sequelize';
import { createSequelize, databaseConfigFrom } from '../../src/lib/server/db/connection';
import type { Row } from './report';
import { SALES } from '../helpers/demo-accounts';

const HEALTH_PER_S = 20;
const IDLE_SECONDS = 5;
const TARGET_MODELS = 40;
const UNITS_PER_CLONE = 8;
const TAG = '(bench search)';

/** A request no demo package meets at once, with a neighbour behind: the search has work to do. */
export const SEARCH_BODY = {
	targetDb: 102, weighting: 'A', distance: 40, distanceUnit: 'm', programme: 'speech',
	startDate: '2034-05-06', endDate: '2034-05-07',
	site: { aimDeg: 0, groundFactor: 0.5, receivers: [{ name: 'Bench house behind', x: 0, y: -250, limitDb: 75, weighting: 'C' }] }
};

function p95(samples: number[]): number {
	const sorted = [...samples].sort((a, b) => a - b);
	return sorted[Math.min(sorted.length - 1, Math.ceil(0.95 * sorted.length) - 1)] ?? NaN;
}

const healthAgent = new http.Agent({ keepAlive: true, maxSockets: 64 });
function healthMs(origin: string): Promise<number> {
	const t = performance.now();
	return new Promise((resolve, reject) => {
		http.get(`${origin}/api/health`, { agent: healthAgent }, (res) => {
			res.resume();
			res.on('end', () => resolve(performance.now() - t));
		}).on('error', reject);
	});
}

/** Health at a steady rate (an open loop: it does not wait for answers) until `until` settles. */
async function healthWhile(origin: string, until: Promise<unknown>): Promise<number[]> {
	let done = false;
	void until.finally(() => (done = true));
	const samples: Promise<number>[] = [];
	const start = performance.now();
	for (let i = 0; !done; i++) {
		const wait = start + (i * 1000) / HEALTH_PER_S - performance.now();
		if (wait > 0) await new Promise((r) => setTimeout(r, wait));
		if (!done) samples.push(healthMs(origin));
	}
	return Promise.all(samples);
}

async function suggest(origin: string, cookie: string): Promise<{ ms: number; status: number; evaluated: number; complete: boolean }> {
	const t = performance.now();
	const response = await fetch(`${origin}/api/suggestions`, {
		method: 'POST',
		headers: { cookie, origin, 'content-type': 'application/json', accept: 'application/json' },
		body: JSON.stringify(SEARCH_BODY)
	});
	const body = (await response.json()) as { evaluated?: number; complete?: boolean };
	return { ms: performance.now() - t, status: response.status, evaluated: body.evaluated ?? 0, complete: body.complete ?? false };
}

const select = (db: Sequelize, sql: string, replacements: Record<string, unknown> = {}) =>
	db.query<Record<string, unknown>>(sql, { type: QueryTypes.SELECT, replacements });

async function bumpCatalogue(db: Sequelize): Promise<void> {
	await db.query("INSERT INTO cache_stamps (name, version) VALUES ('catalogue', 1) ON DUPLICATE KEY UPDATE version = version + 1", { type: QueryTypes.INSERT });
}

/** Models with ready units: what the search's budget counts (other tests may leave models without units). */
async function modelsInStock(db: Sequelize): Promise<number> {
	const [{ n }] = await select(db, "SELECT COUNT(DISTINCT modelType, COALESCE(loudspeakerModelId, amplifierModelId)) AS n FROM stock_units WHERE status = 'ready'");
	return Number(n);
}

/** Clones demo models (sensitivity and rate varied a little) with ready units until 40 are in stock. */
async function growTo40(db: Sequelize): Promise<number> {
	const now = new Date();
	for (const table of ['loudspeaker_models', 'amplifier_models'] as const) {
		const rows = await select(db, `SELECT * FROM ${table} WHERE name NOT LIKE :tag ORDER BY id`, { tag: `%${TAG}` });
		const n = await modelsInStock(db);
		const share = table === 'loudspeaker_models' ? Math.ceil(((TARGET_MODELS - Number(n)) * 2) / 3) : TARGET_MODELS - Number(n);
		for (let i = 0; i < share; i++) {
			const { id: _id, ...row } = rows[i % rows.length];
			for (const [k, v] of Object.entries(row)) if (v !== null && typeof v === 'object' && !(v instanceof Date)) row[k] = JSON.stringify(v);
			row.name = `${String(row.name).slice(0, 90)} ${i} ${TAG}`;
			row.dayRateMinor = Number(row.dayRateMinor) + 100 * (i + 1);
			if ('sensitivityDb' in row) row.sensitivityDb = Number(row.sensitivityDb) + ((i % 5) - 2) * 0.5;
			row.createdAt = now;
			row.updatedAt = now;
			await db.getQueryInterface().bulkInsert(table, [row]);
			const [{ id }] = await select(db, `SELECT MAX(id) AS id FROM ${table}`);
			const type = table === 'loudspeaker_models' ? 'loudspeaker' : 'amplifier';
			await db.getQueryInterface().bulkInsert('stock_units', Array.from({ length: UNITS_PER_CLONE }, (_, u) => ({
				serial: `BENCH-SEARCH-${type}-${id}-${u}`, modelType: type, status: 'ready', location: 'Bench bay', notes: '',
				loudspeakerModelId: type === 'loudspeaker' ? id : null, amplifierModelId: type === 'amplifier' ? id : null,
				lastTestedAt: null, createdAt: now, updatedAt: now
			})));
		}
	}
	await bumpCatalogue(db);
	return modelsInStock(db);
}

async function removeClones(db: Sequelize): Promise<void> {
	await db.query("DELETE FROM stock_units WHERE serial LIKE 'BENCH-SEARCH-%'", { type: QueryTypes.DELETE });
	for (const table of ['loudspeaker_models', 'amplifier_models']) await db.query(`DELETE FROM ${table} WHERE name LIKE :tag`, { type: QueryTypes.DELETE, replacements: { tag: `%${TAG}` } });
	await bumpCatalogue(db);
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

export async function measureSearchResponsiveness(env: NodeJS.ProcessEnv, origin: string, salesCookie: string, log: (m: string) => void = () => {}): Promise<Row[]> {
	const rows: Row[] = [];
	log('suggestions over HTTP: health idle, the demo catalogue, then 40 models with health alongside');
	for (let i = 0; i < 20; i++) await healthMs(origin); // warm the connections
	const idle = await healthWhile(origin, new Promise((r) => setTimeout(r, IDLE_SECONDS * 1000)));
	await suggest(origin, salesCookie); // starts the worker thread
	const demo: Awaited<ReturnType<typeof suggest>>[] = [];
	for (let i = 0; i < 3; i++) demo.push(await suggest(origin, salesCookie));
	const demoMs = median(demo.map((d) => d.ms));
	rows.push({ metric: `POST /api/suggestions, demo catalogue (median of 3; ${demo.every((d) => d.complete) ? 'complete' : 'some stopped at the budget'})`, value: demoMs, unit: 'ms', target: '≤ 2000 ms + reading the stock', ok: demo.every((d) => d.status === 200) && demoMs <= 2500 });

	const db = createSequelize(databaseConfigFrom(env));
	try {
		const models = await growTo40(db);
		await new Promise((r) => setTimeout(r, 200));
		const search = suggest(origin, salesCookie);
		const during = await healthWhile(origin, search);
		const large = await search;
		rows.push({ metric: `POST /api/suggestions, ${models} models in stock (${large.complete ? 'complete' : 'stopped at its budget, best so far'}; ${large.evaluated} systems)`, value: large.ms, unit: 'ms', target: '≤ 10000 ms + reading the stock', ok: large.status === 200 && large.ms <= 10_500 });
		rows.push({ metric: `/api/health p95 during that search (${during.length} requests at ${HEALTH_PER_S}/s) vs idle (${idle.length})`, value: p95(during), unit: 'ms', baseline: p95(idle), ratio: p95(during) / p95(idle), target: 'ratio ≤ 3' , ok: p95(during) / p95(idle) <= 3 });
	} finally {
		await removeClones(db);
		await db.close();
	}
	return rows;
}

async function standalone(): Promise<void> {
	const origin = process.env.ORIGIN ?? 'http://127.0.0.1:3100';
	const { sessionCookie } = await import('../e2e/http');
	const rows = await measureSearchResponsiveness(process.env, origin, await sessionCookie(SALES), console.error);
	for (const row of rows) console.log(`${row.metric}: ${row.value.toFixed(1)} ${row.unit}${row.ratio !== undefined ? `, baseline ${row.baseline!.toFixed(1)}, ratio ${row.ratio.toFixed(2)}` : ''}`);
	healthAgent.destroy();
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) void standalone().then(() => process.exit(0));

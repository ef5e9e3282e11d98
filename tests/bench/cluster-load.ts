/**
 * The bench's load through a real proxy: two app processes (scripts/app-processes.sh) behind nginx
 * (scripts/nginx.sh) on the bench database, loaded at 16 and 64 connections. Rows are ratios to
 * GET /api/health on the single process, measured earlier in the same run.
 */
import { loadTarget, type LoadResult, type LoadTarget } from './http-load';
import { must, run } from './proc';
import type { Row } from './report';

const MINUTE = 60_000;
export const CLUSTER_CONNECTIONS = [16, 64];
const SETTINGS = { warmupS: 2, durationS: 8 };

function clusterEnv(env: NodeJS.ProcessEnv): NodeJS.ProcessEnv {
	const o = Number(env.TEST_PORT_OFFSET ?? 0);
	return { ...env, APP_PORTS: `${3250 + o} ${3251 + o}`, NGINX_DIR: '.data/bench/nginx', PROXY_HOST: '127.0.0.1', PROXY_PORT: String(3260 + o) };
}

export async function stopCluster(env: NodeJS.ProcessEnv): Promise<void> {
	const cluster = clusterEnv(env);
	await run('bash', ['scripts/nginx.sh', 'stop'], cluster, MINUTE);
	await run('bash', ['scripts/app-processes.sh', 'stop'], cluster, MINUTE);
}

export async function measureCluster(
	env: NodeJS.ProcessEnv,
	sales: string,
	evaluationBody: string,
	log: (message: string) => void
): Promise<LoadResult[]> {
	const cluster = clusterEnv(env);
	const proxy = `http://127.0.0.1:${cluster.PROXY_PORT}`;
	await must('bash', ['scripts/app-processes.sh', 'start'], cluster, 2 * MINUTE);
	await must('bash', ['scripts/nginx.sh', 'start'], cluster, 2 * MINUTE);
	const targets: LoadTarget[] = [
		{ name: 'GET /api/health', path: '/api/health', headers: { accept: 'application/json' } },
		{
			name: 'POST /api/evaluations (sales)',
			path: '/api/evaluations',
			method: 'POST',
			headers: { cookie: sales, origin: env.ORIGIN!, accept: 'application/json', 'content-type': 'application/json' },
			body: evaluationBody
		}
	];
	const results: LoadResult[] = [];
	try {
		for (const connections of CLUSTER_CONNECTIONS)
			for (const t of targets) {
				log(`loading ${t.name} through nginx → 2 processes, ${connections} connections`);
				const result = await loadTarget(proxy, t, { ...SETTINGS, connections });
				results.push({ ...result, name: `proxy → 2 processes, ${connections} conn: ${t.name}` });
			}
	} finally {
		await stopCluster(env);
	}
	return results;
}

/** Throughput and p95 rows, each a ratio to the single process's /api/health; zero errors required. */
export function clusterRows(results: LoadResult[], health: LoadResult, notes: string[]): Row[] {
	const rows: Row[] = [];
	for (const r of results) {
		const clean = r.non2xx === 0 && r.errors === 0 && r.timeouts === 0;
		if (!clean) notes.push(`${r.name}: ${r.non2xx} non-2xx, ${r.errors} errors, ${r.timeouts} timeouts of ${r.total}`);
		rows.push({
			metric: `${r.name} throughput`,
			value: r.requestsPerSec,
			unit: 'req/s',
			baseline: health.requestsPerSec,
			ratio: r.requestsPerSec / health.requestsPerSec,
			target: 'zero errors',
			ok: clean
		});
		rows.push({ metric: `${r.name} p95`, value: r.p95Ms, unit: 'ms', baseline: health.p95Ms, ratio: r.p95Ms / health.p95Ms });
	}
	return rows;
}

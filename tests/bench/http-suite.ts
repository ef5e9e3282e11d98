/**
 * The HTTP part of the bench: which requests are loaded, and how their results become table rows.
 * /api/health (no session, one tiny query) is the in-run baseline the other targets are divided by.
 */
import { loadTarget, type LoadResult, type LoadTarget } from './http-load';
import type { Row } from './report';

export const LOAD = { connections: 16, warmupS: 2, durationS: 8 };
const P95_TARGET_MS = 100;
const EVALUATIONS_RATIO_TARGET = 0.25;

/** A realistic desk request (schema: src/lib/schemas/evaluation.ts); dates far ahead, so no clashes. */
export const EVALUATION_BODY = {
	targetDb: 100,
	weighting: 'A',
	distance: 30,
	distanceUnit: 'm',
	audienceWidth: 40,
	programme: 'pop-rock',
	boundary: { distance: 400, limitDb: 75, weighting: 'A' },
	startDate: '2031-06-12',
	endDate: '2031-06-13'
};

/** The same request with a site of three receivers entered with it (metres east/north of the system). */
const EVALUATION_WITH_SITE_BODY = {
	...EVALUATION_BODY,
	boundary: undefined,
	site: {
		ground: 'porous',
		aimDeg: 90,
		allowanceDb: 2,
		receivers: [
			{ name: 'Behind', x: -120, y: 20, heightM: 4, limitDb: 65, weighting: 'A' },
			{ name: 'Beside', x: -30, y: -25, limitDb: 75, weighting: 'A' },
			{ name: 'Across', x: 180, y: 260, heightM: 3, limitDb: 75, weighting: 'Z', bandHz: 63 }
		]
	}
};

/**
 * The request with a system composed on the desk (the first package's groups as an inline system):
 * what the composer sends on every edit.
 */
async function composedSystemBody(origin: string, sales: string): Promise<Record<string, unknown>> {
	const get = async (path: string) => {
		const res = await fetch(`${origin}${path}`, { headers: { cookie: sales, accept: 'application/json' } });
		if (!res.ok) throw new Error(`GET ${path} answered ${res.status}`);
		return res.json();
	};
	const [first] = (await get('/api/packages')) as { id: number }[];
	const pkg = (await get(`/api/packages/${first.id}`)) as { groups: Record<string, unknown>[] };
	const fields = ['loudspeakerModelId', 'count', 'stacks', 'amplifierModelId', 'cabinetsPerChannel', 'heightM', 'spacingM', 'flown'];
	const groups = pkg.groups.map((g) => Object.fromEntries(fields.filter((f) => g[f] != null).map((f) => [f, g[f]])));
	return { ...EVALUATION_BODY, system: { groups } };
}

export async function measureHttp(
	origin: string,
	sales: string,
	log: (message: string) => void
): Promise<LoadResult[]> {
	const evaluation = (name: string, body: unknown): LoadTarget => ({
		name,
		path: '/api/evaluations',
		method: 'POST',
		headers: { cookie: sales, origin, accept: 'application/json', 'content-type': 'application/json' },
		body: JSON.stringify(body)
	});
	const targets: LoadTarget[] = [
		{ name: 'GET /api/health', path: '/api/health', headers: { accept: 'application/json' } },
		evaluation('POST /api/evaluations (sales)', EVALUATION_BODY),
		evaluation('POST /api/evaluations with a site (sales)', EVALUATION_WITH_SITE_BODY),
		evaluation('POST /api/evaluations with a composed system (sales)', await composedSystemBody(origin, sales)),
		{ name: 'GET /quotes/new (sales, HTML)', path: '/quotes/new', headers: { cookie: sales, accept: 'text/html' } }
	];
	// Fail early with a clear message if a target does not answer 200 before loading it.
	for (const t of targets) {
		const res = await fetch(`${origin}${t.path}`, {
			method: t.method ?? 'GET',
			headers: t.headers,
			body: t.body,
			redirect: 'manual'
		});
		const text = await res.text();
		if (res.status !== 200)
			throw new Error(`${t.name} answered ${res.status}: ${text.slice(0, 300)}`);
	}
	const results: LoadResult[] = [];
	for (const t of targets) {
		log(
			`loading ${t.name}: ${LOAD.warmupS} s warm-up + ${LOAD.durationS} s, ${LOAD.connections} connections`
		);
		results.push(await loadTarget(origin, t, LOAD));
	}
	return results;
}

export function httpRows(results: LoadResult[], notes: string[]): Row[] {
	const health = results[0];
	const rows: Row[] = [];
	for (const r of results) {
		const clean = r.non2xx === 0 && r.errors === 0 && r.timeouts === 0;
		if (!clean)
			notes.push(
				`${r.name}: ${r.non2xx} non-2xx, ${r.errors} errors, ${r.timeouts} timeouts of ${r.total}`
			);
		const isHealth = r === health;
		const isEvaluations = r.name.startsWith('POST /api/evaluations');
		rows.push({
			metric: `${r.name} throughput`,
			value: r.requestsPerSec,
			unit: 'req/s',
			baseline: isHealth ? undefined : health.requestsPerSec,
			ratio: isHealth ? undefined : r.requestsPerSec / health.requestsPerSec,
			target: isEvaluations ? `ratio ≥ ${EVALUATIONS_RATIO_TARGET}` : undefined,
			ok: isEvaluations
				? clean && r.requestsPerSec / health.requestsPerSec >= EVALUATIONS_RATIO_TARGET
				: undefined
		});
		rows.push({
			metric: `${r.name} p50`,
			value: r.p50Ms,
			unit: 'ms',
			baseline: isHealth ? undefined : health.p50Ms
		});
		rows.push({
			metric: `${r.name} p95`,
			value: r.p95Ms,
			unit: 'ms',
			baseline: isHealth ? undefined : health.p95Ms,
			target: `< ${P95_TARGET_MS} ms`,
			ok: clean && r.p95Ms < P95_TARGET_MS
		});
	}
	return rows;
}

/**
 * `npm run bench`: sets up its own world (tests/bench/world.ts), measures, tears everything down and
 * prints one table (also written to .data/bench/last.json). Never part of `npm test`.
 * `npm run bench -- --in-process` measures only the in-process rows (the acoustic model), with no
 * world, and prints them the same way (written to .data/bench/in-process.json).
 * Ratios compare against a baseline measured in the same run, so runs on different (or busy)
 * machines can still be compared.
 */
import { fileURLToPath } from 'node:url';
import { acousticsRows, runAcousticsBench } from './acoustics.bench';
import { runLevelMapBench } from './level-map.bench';
import { catalogueRows, measureCatalogues, type CatalogueResult } from './catalogue-suite';
import { clusterRows, measureCluster, stopCluster } from './cluster-load';
import { EVALUATION_BODY, httpRows, LOAD, measureHttp } from './http-suite';
import { runSuggestionsBench, runWorkerBench, suggestionsRows } from './suggestions.bench';
import { measureSearchResponsiveness } from './search-responsiveness';
import type { LoadResult } from './http-load';
import { pageWeight, type PageWeight } from './page-weight';
import { stopAll } from './proc';
import { formatTable, writeJson, type Row } from './report';
import { measureStamps } from './stamps.bench';
import { setUpWorld, tearDownWorld, type World } from './world';
import { SALES, WAREHOUSE } from '../helpers/demo-accounts';

process.chdir(fileURLToPath(new URL('../..', import.meta.url)));

const PAGE_JS_TARGET_KB = 200;
const OVERALL_LIMIT_MS = 50 * 60_000;

/** Main pages and who opens them (signed out for /signin). /inventory redirects to its first list. */
const PAGES: { path: string; who: string | null }[] = [
	{ path: '/signin', who: null },
	{ path: '/', who: SALES },
	{ path: '/quotes', who: SALES },
	{ path: '/quotes/new', who: SALES },
	{ path: '/inventory', who: WAREHOUSE }
];

let cleaning: Promise<void> | null = null;
let benchEnvForCluster: NodeJS.ProcessEnv | null = null;
function cleanUp(): Promise<void> {
	cleaning ??= (benchEnvForCluster ? stopCluster(benchEnvForCluster) : Promise.resolve())
		.then(tearDownWorld)
		.finally(stopAll);
	return cleaning;
}
for (const signal of ['SIGINT', 'SIGTERM'] as const) {
	process.once(signal, () => {
		console.error(`\n[bench] ${signal}: stopping the bench world…`);
		void cleanUp().finally(() => process.exit(130));
	});
}
// However things go, the bench stops by itself.
setTimeout(() => {
	console.error('[bench] overall time limit reached; stopping');
	void cleanUp().finally(() => process.exit(2));
}, OVERALL_LIMIT_MS).unref();

const log = (message: string) => console.error(`[bench] ${message}`);

async function main(): Promise<void> {
	const started = Date.now();
	const notes: string[] = [];
	log('acoustic model (in this process, before the world starts)');
	const acoustics = runAcousticsBench();
	log('level map (levelGrid + contours, 100 × 100, in this process)');
	const levelMaps = runLevelMapBench();
	log('suggestion search (demo-sized and 40-model catalogues, in this process and in the search worker thread)');
	const suggestions = runSuggestionsBench();
	const suggestionWorker = await runWorkerBench(suggestions.results);

	log('setting up the bench world from nothing (MariaDB, migrate, seed, fakes, build, boot)…');
	let world: World;
	let load: LoadResult[];
	let clusterLoad: LoadResult[];
	let catalogues: CatalogueResult[];
	let stamps: Row;
	let searchRows: Row[];
	const pages: PageWeight[] = [];
	try {
		world = await setUpWorld();
		notes.push(...world.notes);
		log(`app answered on ${world.origin} (cold start ${world.coldStartS.toFixed(1)} s)`);
		// http.ts reads ORIGIN when first imported, so import it only now.
		process.env.ORIGIN = world.origin;
		const { sessionCookie } = await import('../e2e/http');
		const cookies = new Map<string, string>();
		for (const who of [SALES, WAREHOUSE]) cookies.set(who, await sessionCookie(who));
		load = await measureHttp(world.origin, cookies.get(SALES)!, log);
		searchRows = await measureSearchResponsiveness(world.env, world.origin, cookies.get(SALES)!, log);
		log('weighing the JavaScript of the main pages');
		for (const p of PAGES)
			pages.push(
				await pageWeight(
					world.origin,
					p.path,
					p.who ?? 'signed out',
					p.who ? cookies.get(p.who)! : ''
				)
			);
		log('change stamps: one read per request');
		stamps = await measureStamps(world.env);
		benchEnvForCluster = world.env;
		const body = JSON.stringify(EVALUATION_BODY);
		clusterLoad = await measureCluster(world.env, cookies.get(SALES)!, body, log);
		catalogues = await measureCatalogues(
			world.env,
			{ sales: cookies.get(SALES)!, warehouse: cookies.get(WAREHOUSE)! },
			body,
			log
		);
	} finally {
		log('stopping the bench world');
		await cleanUp();
	}

	const rows: Row[] = [
		{
			metric: 'cold start (db init + migrate + seed + build + boot)',
			value: world.coldStartS,
			unit: 's'
		},
		{ metric: 'app boot (node build → /api/health 200)', value: world.bootS, unit: 's' },
		...acousticsRows(acoustics),
		...suggestionsRows(suggestions),
		...suggestionWorker,
		...searchRows,
		...levelMaps.map((m) => ({
			metric: m.name,
			value: m.opsPerSec,
			unit: '/s',
			baseline: m.baselineOpsPerSec,
			ratio: m.ratio,
			target: '≥ 10/s',
			ok: m.opsPerSec >= 10
		})),
		...httpRows(load, notes),
		stamps,
		...clusterRows(clusterLoad, load[0], notes),
		...catalogueRows(catalogues, load[0], notes),
		...pages.map((p) => ({
			metric: `JS for ${p.path}${p.finalPath !== p.path ? ` (→ ${p.finalPath})` : ''} as ${p.role.split('@')[0]}, ${p.modules} modules`,
			value: p.gzipKb,
			unit: 'KB gz',
			target: `≤ ${PAGE_JS_TARGET_KB} KB gz`,
			ok: p.gzipKb <= PAGE_JS_TARGET_KB
		}))
	];
	if (world.excludedWaitS >= 0.5)
		notes.push(
			`${world.excludedWaitS.toFixed(0)} s of waiting for other builds/retries left out of the cold start`
		);
	for (const p of pages)
		if (p.missingNodes.length)
			notes.push(
				`${p.path}: route modules for node ids ${p.missingNodes.join(', ')} not found; its JS figure is too low`
			);
	if (world.buildAttempts > 1) notes.push(`build needed ${world.buildAttempts} attempts`);
	notes.push(
		'acoustics baseline = sumLevels over 9 values; HTTP baseline = GET /api/health in this run',
		`HTTP: autocannon in this process, ${LOAD.connections} connections, ${LOAD.warmupS} s warm-up then ${LOAD.durationS} s; p50/p95 computed from every response time`,
		'JS: modules named by the page (HTML + modulepreload link header) plus their static imports (dynamic import() not followed), gzip via node:zlib'
	);

	console.log(
		`\nThrowline bench — ${new Date().toISOString()} (${((Date.now() - started) / 1000).toFixed(0)} s)\n`
	);
	console.log(formatTable(rows));
	console.log(`\n${notes.map((n) => `· ${n}`).join('\n')}`);
	writeJson('.data/bench/last.json', {
		at: new Date().toISOString(),
		rows,
		load,
		clusterLoad,
		catalogues,
		pages,
		acoustics,
		world: { ...world, env: undefined },
		notes
	});
	console.log('\n(also written to .data/bench/last.json)');
}

/** Only the rows measured in this process: no database, no app, nothing to tear down. */
async function inProcessOnly(): Promise<void> {
	const started = Date.now();
	log('acoustic model (in this process only)');
	const acoustics = runAcousticsBench();
	log('suggestion search (in this process and in the search worker thread)');
	const suggestions = runSuggestionsBench();
	const rows = [...acousticsRows(acoustics), ...suggestionsRows(suggestions), ...(await runWorkerBench(suggestions.results))];
	console.log(
		`\nThrowline bench, in-process rows — ${new Date().toISOString()} (${((Date.now() - started) / 1000).toFixed(0)} s)\n`
	);
	console.log(formatTable(rows));
	console.log('\n· acoustics baseline = sumLevels over 9 values, measured in this run');
	writeJson('.data/bench/in-process.json', { at: new Date().toISOString(), rows, acoustics });
	console.log('\n(also written to .data/bench/in-process.json)');
}

(process.argv.includes('--in-process') ? Promise.resolve().then(inProcessOnly) : main()).then(
	() => process.exit(0),
	async (err: unknown) => {
		const cause = err instanceof Error && err.cause ? ` (${String((err.cause as Error).message ?? err.cause)})` : '';
		console.error('[bench] failed:', err instanceof Error ? `${err.message}${cause}` : err);
		if (err instanceof Error && err.stack) console.error(err.stack.split('\n').slice(0, 6).join('\n'));
		await cleanUp();
		process.exit(1);
	}
);

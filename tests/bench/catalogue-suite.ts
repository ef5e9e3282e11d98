/**
 * The quoting engine and the warehouse's pages as the catalogue grows: measured on the demo, then
 * with the bench database grown to 10× and 100× (catalogue.ts). Ratios are to GET /api/health on the
 * same process in the same run; the rows side by side give the curve.
 */
import { createSequelize, databaseConfigFrom } from '../../src/lib/server/db/connection';
import { growCatalogue, SIZES, someBookingId } from './catalogue';
import { loadTarget, type LoadResult, type LoadTarget } from './http-load';
import type { Row } from './report';

// Few connections and a longer run: at 100× one answer can take seconds, and a run shorter than
// the answers would count none.
const SETTINGS = { connections: 4, warmupS: 1, durationS: 8 };

export interface CatalogueResult {
	size: string;
	contents: string;
	loads: LoadResult[];
}

async function targetsFor(origin: string, sales: string, warehouse: string, bookingId: number, evaluationBody: string): Promise<LoadTarget[]> {
	return [
		{
			name: 'POST /api/evaluations (sales)',
			path: '/api/evaluations',
			method: 'POST',
			headers: { cookie: sales, origin, accept: 'application/json', 'content-type': 'application/json' },
			body: evaluationBody
		},
		{ name: 'GET /quotes (sales, HTML)', path: '/quotes', headers: { cookie: sales, accept: 'text/html' } },
		{ name: 'GET /bookings (warehouse, HTML)', path: '/bookings', headers: { cookie: warehouse, accept: 'text/html' } },
		{ name: 'GET /bookings/:id pick list (warehouse, HTML)', path: `/bookings/${bookingId}`, headers: { cookie: warehouse, accept: 'text/html' } }
	];
}

export async function measureCatalogues(
	env: NodeJS.ProcessEnv,
	cookies: { sales: string; warehouse: string },
	evaluationBody: string,
	log: (message: string) => void
): Promise<CatalogueResult[]> {
	const db = createSequelize(databaseConfigFrom(env));
	const results: CatalogueResult[] = [];
	try {
		for (const size of [null, ...SIZES]) {
			let contents = 'demo';
			if (size) {
				log(`growing the bench catalogue to ${size.label} (${size.packages} packages, ${size.stockUnits} units, ${size.bookings} hires)`);
				contents = await growCatalogue(db, size);
				await new Promise((r) => setTimeout(r, 500));
			}
			const targets = await targetsFor(env.ORIGIN!, cookies.sales, cookies.warehouse, await someBookingId(db), evaluationBody);
			const loads: LoadResult[] = [];
			for (const t of targets) {
				log(`catalogue ${size?.label ?? '1×'}: loading ${t.name}, ${SETTINGS.connections} connections`);
				loads.push(await loadTarget(env.ORIGIN!, t, SETTINGS));
			}
			results.push({ size: size?.label ?? '1× (demo)', contents, loads });
		}
	} finally {
		await db.close();
	}
	return results;
}

export function catalogueRows(results: CatalogueResult[], health: LoadResult, notes: string[]): Row[] {
	const rows: Row[] = [];
	for (const { size, contents, loads } of results) {
		notes.push(`catalogue ${contents}`);
		for (const r of loads) {
			const clean = r.non2xx === 0 && r.errors === 0 && r.timeouts === 0;
			if (!clean) notes.push(`catalogue ${size} ${r.name}: ${r.non2xx} non-2xx, ${r.errors} errors, ${r.timeouts} timeouts of ${r.total}`);
			rows.push({
				metric: `catalogue ${size}: ${r.name} throughput`,
				value: r.requestsPerSec,
				unit: 'req/s',
				baseline: health.requestsPerSec,
				ratio: r.requestsPerSec / health.requestsPerSec,
				target: 'zero errors',
				ok: clean
			});
			rows.push({ metric: `catalogue ${size}: ${r.name} p95`, value: r.p95Ms, unit: 'ms', baseline: health.p95Ms, ratio: r.p95Ms / health.p95Ms });
		}
	}
	return rows;
}

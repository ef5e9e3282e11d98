/**
 * HTTP load with autocannon on loopback: a short warm-up, then a bounded measured run per target.
 * autocannon reports p50/p90/p97.5/p99 but not p95, so each response time is also recorded here and
 * p50/p95 are computed exactly from those samples.
 */
import autocannon, { type Options, type Result } from 'autocannon';

export interface LoadTarget {
	name: string;
	path: string;
	method?: 'GET' | 'POST';
	headers?: Record<string, string>;
	body?: string;
}

export interface LoadResult {
	name: string;
	requestsPerSec: number;
	p50Ms: number;
	p95Ms: number;
	/** autocannon's own figures, kept for cross-checking. */
	autocannonP50Ms: number;
	autocannonP97_5Ms: number;
	total: number;
	non2xx: number;
	errors: number;
	timeouts: number;
	samples: number;
}

export interface LoadSettings {
	connections: number;
	warmupS: number;
	durationS: number;
}

// Enough for ~60k responses/s over 8 s; beyond that the samples are a prefix, still representative.
const MAX_SAMPLES = 500_000;

function percentile(sorted: number[], p: number): number {
	if (sorted.length === 0) return NaN;
	const index = Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1);
	return sorted[Math.max(0, index)];
}

/** One autocannon run; `onLatency` sees every response time in ms. */
function fire(options: Options, onLatency?: (ms: number) => void): Promise<Result> {
	return new Promise((resolve, reject) => {
		const instance = autocannon(options, (err, result) => (err ? reject(err) : resolve(result)));
		if (onLatency) {
			instance.on('response', (_client: unknown, _status: number, _bytes: number, ms: number) =>
				onLatency(ms)
			);
		}
		// autocannon stops itself after `duration`; this is a backstop so the bench can never hang.
		setTimeout(() => instance.stop(), ((options.duration ?? 10) + 15) * 1000).unref();
	});
}

export async function loadTarget(
	origin: string,
	target: LoadTarget,
	settings: LoadSettings
): Promise<LoadResult> {
	if (!/^http:\/\/(127\.0\.0\.1|localhost|\[::1\])(:\d+)?$/.test(origin)) {
		throw new Error(`refusing to load ${origin}: loopback only`);
	}
	const options: Options = {
		url: `${origin}${target.path}`,
		connections: settings.connections,
		method: target.method ?? 'GET',
		headers: target.headers,
		body: target.body,
		timeout: 10
	};
	await fire({ ...options, duration: settings.warmupS });
	const samples: number[] = [];
	const result = await fire({ ...options, duration: settings.durationS }, (ms) => {
		if (samples.length < MAX_SAMPLES) samples.push(ms);
	});
	samples.sort((a, b) => a - b);
	return {
		name: target.name,
		requestsPerSec: result.requests.average,
		p50Ms: percentile(samples, 50),
		p95Ms: percentile(samples, 95),
		autocannonP50Ms: result.latency.p50,
		autocannonP97_5Ms: result.latency.p97_5,
		total: result.requests.total,
		non2xx: result.non2xx,
		errors: result.errors,
		timeouts: result.timeouts,
		samples: samples.length
	};
}

/** The slice of autocannon 8's programmatic API the bench uses (the package ships no types). */
declare module 'autocannon' {
	import type { EventEmitter } from 'node:events';

	interface Options {
		url: string;
		connections?: number;
		duration?: number;
		method?: string;
		headers?: Record<string, string>;
		body?: string;
		timeout?: number;
	}
	interface Histogram {
		average: number;
		p50: number;
		p90: number;
		p97_5: number;
		p99: number;
		max: number;
	}
	interface Result {
		requests: Histogram & { total: number };
		latency: Histogram;
		duration: number;
		errors: number;
		timeouts: number;
		non2xx: number;
		'2xx': number;
	}
	interface Instance extends EventEmitter {
		stop(): void;
	}
	function autocannon(
		options: Options,
		done: (err: Error | null, result: Result) => void
	): Instance;
	export default autocannon;
	export type { Options, Result, Instance };
}

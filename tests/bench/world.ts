/**
 * The bench's own world, built the way scripts/test.sh builds the test world (same settings file,
 * same scripts) but on other ports and folders, so it can run beside `npm start` and `npm test`.
 * Everything is started from nothing so the cold start is a real one.
 */
import { openSync, closeSync, mkdirSync, rmSync } from 'node:fs';
import type { ChildProcess } from 'node:child_process';
import { must, run, sleep, startDetached, stop } from './proc';

/** Ports shift with TEST_PORT_OFFSET, as the test world's do, so checkouts can bench side by side. */
const port = (base: number) => String(base + Number(process.env.TEST_PORT_OFFSET ?? 0));

/** Differences from scripts/test-env.sh: only ports, database name and folders. */
const BENCH_OVERRIDES: Record<string, string> = {
	DB_DIR: '.data/bench/mariadb',
	DATABASE_PORT: port(3327),
	DATABASE_NAME: 'throwline_bench',
	PORT: port(3200),
	ORIGIN: `http://127.0.0.1:${port(3200)}`,
	RUN_DIR: '.data/bench/run',
	BUILD_DIR: '.data/bench/build',
	SMTP_PORT: port(2726),
	SMTP_HTTP_PORT: port(2780),
	STRIPE_API_PORT: port(12411),
	STRIPE_WEBHOOK_URL: `http://127.0.0.1:${port(3200)}/api/webhooks/stripe`,
	MAIL_DIR: '.data/bench/mail',
	UPLOAD_DIR: '.data/bench/uploads'
};

const MINUTE = 60_000;

/** Sources scripts/test-env.sh in bash (so there is one source of truth) and lays the overrides on top. */
export async function benchEnv(): Promise<NodeJS.ProcessEnv> {
	const dump = await must('bash', ['-c', '. scripts/test-env.sh && env -0'], process.env, 10_000);
	const env: NodeJS.ProcessEnv = {};
	for (const entry of dump.split('\0')) {
		const eq = entry.indexOf('=');
		if (eq > 0) env[entry.slice(0, eq)] = entry.slice(eq + 1);
	}
	return { ...env, ...BENCH_OVERRIDES };
}

export interface World {
	env: NodeJS.ProcessEnv;
	origin: string;
	coldStartS: number;
	bootS: number;
	/** Time spent waiting for other people's builds or between retries, left out of coldStartS. */
	excludedWaitS: number;
	buildAttempts: number;
	notes: string[];
}

let app: ChildProcess | null = null;
let worldEnv: NodeJS.ProcessEnv | null = null;

/** Polls /api/health until it answers 200; bounded by `timeoutMs`. */
async function waitForHealth(origin: string, timeoutMs: number): Promise<boolean> {
	const deadline = Date.now() + timeoutMs;
	while (Date.now() < deadline) {
		if (app && app.exitCode !== null) return false;
		try {
			const res = await fetch(`${origin}/api/health`, { signal: AbortSignal.timeout(1000) });
			await res.arrayBuffer();
			if (res.status === 200) return true;
		} catch {
			// not listening yet
		}
		await sleep(50);
	}
	return false;
}

/** Concurrent `vite build` runs share .svelte-kit/output; wait (bounded) until nobody else builds. */
async function waitForOtherBuilds(env: NodeJS.ProcessEnv, notes: string[]): Promise<number> {
	const start = Date.now();
	for (let i = 0; i < 450; i++) {
		const busy = (await run('pgrep', ['-f', 'vite.js build'], env, 5000)).code === 0;
		if (!busy) break;
		if (i === 0) notes.push('waited for another vite build to finish before building');
		await sleep(2000);
	}
	return (Date.now() - start) / 1000;
}

/** Builds into BUILD_DIR under the shared build lock, retrying (up to 3 times) a broken tree. */
async function build(
	env: NodeJS.ProcessEnv,
	notes: string[]
): Promise<{ excludedS: number; attempts: number }> {
	let excludedS = 0;
	for (let attempt = 1; attempt <= 3; attempt++) {
		excludedS += await waitForOtherBuilds(env, notes);
		const started = Date.now();
		const args = [
			'.data/build.lock',
			'node',
			'node_modules/vite/bin/vite.js',
			'build',
			'--logLevel',
			'error'
		];
		const result = await run('flock', args, env, 10 * MINUTE);
		if (result.code === 0) return { excludedS, attempts: attempt };
		excludedS += (Date.now() - started) / 1000;
		const tail = result.output.trim().split('\n').slice(-6).join(' | ');
		notes.push(`build attempt ${attempt} failed: ${tail.slice(0, 400)}`);
		if (attempt === 3) throw new Error(`build failed 3 times:\n${result.output.slice(-3000)}`);
		await sleep(MINUTE);
		excludedS += 60;
	}
	throw new Error('unreachable');
}

/** Boots the built app and returns seconds until /api/health answers 200. */
async function boot(env: NodeJS.ProcessEnv, origin: string): Promise<number> {
	const runDir = env.RUN_DIR!;
	const log = openSync(`${runDir}/app.log`, 'w');
	const started = performance.now();
	app = startDetached('node', [env.BUILD_DIR!], env, log);
	closeSync(log); // the child keeps its own copy of the descriptor
	if (!(await waitForHealth(origin, 60_000)))
		throw new Error(`app did not answer /api/health; see ${runDir}/app.log`);
	return (performance.now() - started) / 1000;
}

export async function setUpWorld(): Promise<World> {
	const env = await benchEnv();
	worldEnv = env;
	const origin = env.ORIGIN!;
	const notes: string[] = [];
	// Start from nothing: stop a leftover bench database (only ours), then remove the bench folders.
	await run('bash', ['scripts/fakes.sh', 'stop'], env, 20_000);
	await run('bash', ['scripts/db.sh', 'stop'], env, 60_000);
	for (const key of ['DB_DIR', 'RUN_DIR', 'BUILD_DIR', 'MAIL_DIR', 'UPLOAD_DIR']) {
		rmSync(env[key]!, { recursive: true, force: true });
	}
	mkdirSync(env.RUN_DIR!, { recursive: true });

	const t0 = performance.now();
	await must('bash', ['scripts/db.sh', 'start'], env, 5 * MINUTE);
	await must('bash', ['scripts/db.sh', 'drop'], env, MINUTE);
	await must('node', ['--import', 'tsx', 'scripts/migrate.ts', 'up'], env, 5 * MINUTE);
	await must('node', ['--import', 'tsx', 'scripts/migrate.ts', 'seed'], env, 5 * MINUTE);
	await must('bash', ['scripts/fakes.sh', 'start'], env, MINUTE);
	const built = await build(env, notes);
	const bootS = await boot(env, origin);
	const coldStartS = (performance.now() - t0) / 1000 - built.excludedS;
	return {
		env,
		origin,
		coldStartS,
		bootS,
		excludedWaitS: built.excludedS,
		buildAttempts: built.attempts,
		notes
	};
}

/** Stops the app, the fakes and the bench MariaDB. Safe to call twice and after a partial setup. */
export async function tearDownWorld(): Promise<void> {
	if (app) await stop(app);
	app = null;
	const env = worldEnv;
	worldEnv = null;
	if (!env) return;
	await run('bash', ['scripts/fakes.sh', 'stop'], env, 20_000);
	await run('bash', ['scripts/db.sh', 'stop'], env, 60_000);
}

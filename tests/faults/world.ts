/**
 * The fault tests' own world (vitest globalSetup): MariaDB, fakes and the built app on ports and
 * folders nobody else uses, so stopping the database or the mail sink here never disturbs the
 * browser tests, `npm start` or the bench. Settings are scripts/test-env.sh with the overrides below.
 *
 * The app runs from a copy of the test build taken under the build lock, so a rebuild by someone
 * else halfway through this run cannot swap files under the running server. FAULTS_BUILD_DIR
 * points the copy at another build (to try an app change without touching the shared one).
 */
import {
	closeSync,
	existsSync,
	mkdirSync,
	openSync,
	readFileSync,
	rmSync,
	writeFileSync
} from 'node:fs';
import type { ChildProcess } from 'node:child_process';
import type { TestProject } from 'vitest/node';
import { must, run, startDetached, stop } from '../bench/proc';
import type { WorldInfo } from './world-info';

const OVERRIDES: Record<string, string> = {
	DB_DIR: '.data/faults/mariadb',
	DATABASE_PORT: '3347',
	DATABASE_NAME: 'throwline_faults',
	PORT: '3400',
	ORIGIN: 'http://127.0.0.1:3400',
	RUN_DIR: '.data/faults/run',
	SMTP_PORT: '2926',
	SMTP_HTTP_PORT: '2980',
	STRIPE_API_PORT: '12511',
	STRIPE_WEBHOOK_URL: 'http://127.0.0.1:3400/api/webhooks/stripe',
	MAIL_DIR: '.data/faults/mail',
	UPLOAD_DIR: '.data/faults/uploads',
	// Retry queued e-mail every second so the mail test need not wait the default 30 s.
	MAIL_RETRY_MS: '1000'
};
const SHARED_BUILD = '.data/test/build';
const APP_BUILD = '.data/faults/build';
const MINUTE = 60_000;

let app: ChildProcess | null = null;
let worldEnv: NodeJS.ProcessEnv | null = null;

/** scripts/test-env.sh sourced by bash (one source of truth), with the overrides on top. */
async function faultsEnv(): Promise<NodeJS.ProcessEnv> {
	const dump = await must('bash', ['-c', '. scripts/test-env.sh && env -0'], process.env, 10_000);
	const env: NodeJS.ProcessEnv = {};
	for (const entry of dump.split('\0')) {
		const eq = entry.indexOf('=');
		if (eq > 0) env[entry.slice(0, eq)] = entry.slice(eq + 1);
	}
	// vitest marks its own process (VITEST, TEST, NODE_ENV=test); the app must not inherit that.
	for (const key of Object.keys(env))
		if (key.startsWith('VITEST') || key === 'TEST') delete env[key];
	return { ...env, ...OVERRIDES, BUILD_DIR: APP_BUILD };
}

/** Copies the built app (building it first if nobody has) while holding the shared build lock. */
async function snapshotBuild(env: NodeJS.ProcessEnv): Promise<void> {
	const source = process.env.FAULTS_BUILD_DIR || SHARED_BUILD;
	mkdirSync('.data', { recursive: true });
	if (!existsSync(`${source}/index.js`)) {
		const buildEnv = { ...env, BUILD_DIR: source };
		await must(
			'flock',
			['.data/build.lock', 'node', 'node_modules/vite/bin/vite.js', 'build', '--logLevel', 'error'],
			buildEnv,
			10 * MINUTE
		);
	}
	rmSync(APP_BUILD, { recursive: true, force: true });
	await must('flock', ['.data/build.lock', 'cp', '-r', source, APP_BUILD], env, MINUTE);
}

async function healthy(origin: string): Promise<boolean> {
	try {
		const res = await fetch(`${origin}/api/health`, { signal: AbortSignal.timeout(1000) });
		await res.arrayBuffer();
		return res.status === 200;
	} catch {
		return false;
	}
}

async function startApp(env: NodeJS.ProcessEnv): Promise<void> {
	const runDir = env.RUN_DIR!;
	const log = openSync(`${runDir}/app.log`, 'w');
	app = startDetached('node', [APP_BUILD], env, log);
	closeSync(log); // the child keeps its own copy of the descriptor
	const deadline = Date.now() + MINUTE;
	while (Date.now() < deadline && app.exitCode === null) {
		if (await healthy(env.ORIGIN!)) return;
		await new Promise((r) => setTimeout(r, 100));
	}
	throw new Error(`the app on ${env.ORIGIN} did not become healthy; see ${runDir}/app.log`);
}

const alive = (pid: number) => {
	try {
		process.kill(pid, 0);
		return true;
	} catch {
		return false;
	}
};

/** An app left by an interrupted earlier run holds the port: end it by its recorded pid. */
async function stopLeftovers(env: NodeJS.ProcessEnv): Promise<void> {
	const pidFile = `${env.RUN_DIR}/app.pid`;
	const pid = existsSync(pidFile) ? Number(readFileSync(pidFile, 'utf8')) : 0;
	if (pid > 0 && alive(pid)) {
		process.kill(pid, 'SIGTERM');
		for (let i = 0; i < 50 && alive(pid); i++) await new Promise((r) => setTimeout(r, 100));
	}
	await run('bash', ['scripts/fakes.sh', 'stop'], env, 20_000);
}

export default async function setup(project: TestProject): Promise<() => Promise<void>> {
	const env = await faultsEnv();
	worldEnv = env;
	try {
		await bringUp(env);
	} catch (err) {
		await tearDown(); // vitest does not call the teardown of a setup that threw
		throw err;
	}
	const info: WorldInfo = {
		origin: env.ORIGIN!,
		env: Object.fromEntries(
			Object.entries(env).filter((e): e is [string, string] => e[1] !== undefined)
		),
		mailApi: `http://127.0.0.1:${env.SMTP_HTTP_PORT}`,
		stripeApi: `http://127.0.0.1:${env.STRIPE_API_PORT}`
	};
	project.provide('faultsWorld', info);
	return tearDown;
}

async function bringUp(env: NodeJS.ProcessEnv): Promise<void> {
	const started = performance.now();
	await stopLeftovers(env);
	for (const dir of [env.MAIL_DIR!, env.UPLOAD_DIR!, env.RUN_DIR!])
		rmSync(dir, { recursive: true, force: true });
	mkdirSync(env.RUN_DIR!, { recursive: true });

	await must('bash', ['scripts/db.sh', 'start'], env, 5 * MINUTE);
	await must('bash', ['scripts/db.sh', 'drop'], env, MINUTE);
	await must('node', ['--import', 'tsx', 'scripts/migrate.ts', 'up'], env, 5 * MINUTE);
	await must('node', ['--import', 'tsx', 'scripts/migrate.ts', 'seed'], env, 5 * MINUTE);
	await must('bash', ['scripts/fakes.sh', 'start'], env, MINUTE);
	await snapshotBuild(env);
	await startApp(env);
	writeFileSync(`${env.RUN_DIR}/app.pid`, String(app!.pid));
	console.log(
		`[faults] world up on ${env.ORIGIN} in ${((performance.now() - started) / 1000).toFixed(1)} s`
	);
}

/** Stops the app, the fakes and the world's MariaDB; safe after a partial setup. */
async function tearDown(): Promise<void> {
	if (app) await stop(app);
	app = null;
	const env = worldEnv;
	worldEnv = null;
	if (!env) return;
	rmSync(`${env.RUN_DIR}/app.pid`, { force: true });
	await run('bash', ['scripts/fakes.sh', 'stop'], env, 20_000);
	await run('bash', ['scripts/db.sh', 'stop'], env, MINUTE);
}

/**
 * Does a flood of wrong passwords slow everyone else? Against a running app ($ORIGIN, e.g. the
 * test world: `bash scripts/test-world.sh up`), `/api/health` is asked 20 times a second for a few
 * seconds, first alone, then while 15 wrong sign-ins a second arrive (each a different unknown
 * e-mail, as a password-spraying attacker would send). Prints both p95s and their ratio.
 *   . scripts/test-env.sh && npx tsx tests/bench/sign-in-flood.ts
 */
import { randomUUID } from 'node:crypto';
import http from 'node:http';

const ORIGIN = process.env.ORIGIN ?? 'http://127.0.0.1:3100';
const SECONDS = Number(process.env.FLOOD_SECONDS ?? 8);
const HEALTH_PER_S = 20;
const SIGN_INS_PER_S = 15;

function p95(samples: number[]): number {
	const sorted = [...samples].sort((a, b) => a - b);
	return sorted[Math.min(sorted.length - 1, Math.ceil(0.95 * sorted.length) - 1)];
}

/** Calls `fire` at a steady rate for SECONDS, not waiting for answers (an open loop, like real traffic). */
async function steady(perSecond: number, fire: () => Promise<void>): Promise<void> {
	const pending: Promise<void>[] = [];
	const start = performance.now();
	for (let i = 0; i < perSecond * SECONDS; i++) {
		const due = start + (i * 1000) / perSecond;
		const wait = due - performance.now();
		if (wait > 0) await new Promise((r) => setTimeout(r, wait));
		pending.push(fire().catch(() => undefined));
	}
	await Promise.all(pending);
}

// Health goes through node:http with its own connections, so it never queues in the client
// behind the flood's slow answers (fetch shares one pool per origin).
const healthAgent = new http.Agent({ keepAlive: true, maxSockets: 64 });
function healthOnce(): Promise<void> {
	return new Promise((resolve, reject) => {
		http.get(`${ORIGIN}/api/health`, { agent: healthAgent }, (res) => {
			res.resume();
			res.on('end', resolve);
		}).on('error', reject);
	});
}

async function healthP95(): Promise<number> {
	const samples: number[] = [];
	await steady(HEALTH_PER_S, async () => {
		const t = performance.now();
		await healthOnce();
		samples.push(performance.now() - t);
	});
	return p95(samples);
}

const statuses = new Map<number, number>();
async function wrongSignIn(): Promise<void> {
	const response = await fetch(`${ORIGIN}/auth/callback/credentials`, {
		method: 'POST',
		redirect: 'manual',
		headers: { origin: ORIGIN, 'content-type': 'application/x-www-form-urlencoded' },
		body: new URLSearchParams({ email: `spray-${randomUUID().slice(0, 8)}@example.test`, password: 'not-the-password' })
	});
	await response.arrayBuffer();
	statuses.set(response.status, (statuses.get(response.status) ?? 0) + 1);
}

await healthP95(); // warm-up
const alone = await healthP95();
const [flooded] = await Promise.all([healthP95(), steady(SIGN_INS_PER_S, wrongSignIn)]);
console.log(`/api/health p95 alone ${alone.toFixed(1)} ms, during ${SIGN_INS_PER_S} wrong sign-ins/s ${flooded.toFixed(1)} ms`);
healthAgent.destroy();
console.log(`ratio flooded/alone: ${(flooded / alone).toFixed(2)}; sign-in answers: ${JSON.stringify(Object.fromEntries(statuses))}`);

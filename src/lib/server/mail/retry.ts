/**
 * The outbox's retry timer: messages that could not leave at once (SMTP server down or slow) are
 * tried again every MAIL_RETRY_MS (default 30 s) until they go or run out of attempts.
 */
import { env } from '$env/dynamic/private';
import { retryQueuedEmails } from './outbox';

const DEFAULT_INTERVAL_MS = 30_000;

export interface Repeating {
	/** Runs one pass now, unless one is still running (then answers that one). */
	runOnce(): Promise<void>;
	stop(): void;
}

/**
 * Calls `pass` every `intervalMs`. A slow pass is never overlapped by the next (both would pick the
 * same rows and send them twice); a failing pass is reported to `onError` and the timer goes on.
 * The timer is unref'd so it never keeps the process alive on shutdown.
 */
export function repeatWithoutOverlap(
	pass: () => Promise<void>,
	intervalMs: number,
	onError: (err: unknown) => void
): Repeating {
	let running: Promise<void> | null = null;
	const runOnce = () =>
		(running ??= pass()
			.catch(onError)
			.finally(() => {
				running = null;
			}));
	const timer = setInterval(() => void runOnce(), intervalMs);
	timer.unref();
	return { runOnce, stop: () => clearInterval(timer) };
}

export function retryIntervalMs(value: string | undefined): number {
	const ms = Number(value);
	return Number.isFinite(ms) && ms >= 100 ? ms : DEFAULT_INTERVAL_MS;
}

// One timer per process, even if the server's init hook runs again (dev reloads).
const cache = globalThis as unknown as { throwlineMailRetry?: Repeating };

export function startMailRetry(): Repeating {
	cache.throwlineMailRetry ??= repeatWithoutOverlap(
		async () => {
			const { sent, failed, serverDown } = await retryQueuedEmails();
			if (sent > 0 || (failed > 0 && !serverDown))
				console.log(`[mail-retry] sent ${sent}, still failing ${failed}`);
		},
		retryIntervalMs(env.MAIL_RETRY_MS),
		(err) => console.error('[mail-retry] pass failed:', (err as Error).message)
	);
	return cache.throwlineMailRetry;
}

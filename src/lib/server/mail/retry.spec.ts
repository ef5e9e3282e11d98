import { afterEach, describe, expect, it, vi } from 'vitest';
import { repeatWithoutOverlap, retryIntervalMs } from './retry';

afterEach(() => {
	vi.useRealTimers();
});

/** A pass that stays running until the test lets it finish. */
function controllablePass() {
	let calls = 0;
	let finish: () => void = () => undefined;
	const pass = () => {
		calls++;
		return new Promise<void>((resolve) => (finish = resolve));
	};
	return { pass, calls: () => calls, finish: () => finish() };
}

describe('repeatWithoutOverlap', () => {
	it('never starts a pass while the previous one is still running', async () => {
		vi.useFakeTimers();
		const slow = controllablePass();
		const loop = repeatWithoutOverlap(slow.pass, 1000, () => undefined);
		await vi.advanceTimersByTimeAsync(1000);
		expect(slow.calls()).toBe(1);
		await vi.advanceTimersByTimeAsync(5000); // five more ticks while the first pass hangs
		expect(slow.calls()).toBe(1);
		slow.finish();
		await vi.advanceTimersByTimeAsync(1000);
		expect(slow.calls()).toBe(2);
		loop.stop();
	});

	it('logs a failing pass and keeps going', async () => {
		vi.useFakeTimers();
		const errors: unknown[] = [];
		let calls = 0;
		const loop = repeatWithoutOverlap(
			async () => {
				calls++;
				throw new Error('smtp down');
			},
			1000,
			(err) => errors.push(err)
		);
		await vi.advanceTimersByTimeAsync(3000);
		expect(calls).toBe(3);
		expect(errors).toHaveLength(3);
		loop.stop();
		await vi.advanceTimersByTimeAsync(3000);
		expect(calls).toBe(3);
	});

	it('runOnce during a running pass joins it instead of starting another', async () => {
		const slow = controllablePass();
		const loop = repeatWithoutOverlap(slow.pass, 60_000, () => undefined);
		const first = loop.runOnce();
		const second = loop.runOnce();
		expect(second).toBe(first);
		slow.finish();
		await first;
		expect(slow.calls()).toBe(1);
		loop.stop();
	});
});

describe('retryIntervalMs', () => {
	it('reads MAIL_RETRY_MS and falls back to 30 s for missing or silly values', () => {
		expect(retryIntervalMs('1000')).toBe(1000);
		expect(retryIntervalMs(undefined)).toBe(30_000);
		expect(retryIntervalMs('0')).toBe(30_000);
		expect(retryIntervalMs('soon')).toBe(30_000);
	});
});

/**
 * Child processes for the bench: every command has a time limit, and every child still running is
 * remembered so an error or Ctrl-C can end exactly the processes this script started. Each child
 * leads its own process group, so ending it also ends what it spawned (flock → vite build) and
 * nothing else.
 */
import { spawn, type ChildProcess } from 'node:child_process';

const running = new Set<ChildProcess>();

/** Signals the child's own process group (it was spawned detached, so the group id is its pid). */
function signal(child: ChildProcess, sig: NodeJS.Signals): void {
	try {
		if (child.pid) process.kill(-child.pid, sig);
	} catch {
		child.kill(sig);
	}
}

export interface RunResult {
	code: number;
	output: string;
}

/** Runs a command to completion (or until `timeoutMs`), collecting stdout+stderr. Never throws. */
export function run(
	cmd: string,
	args: string[],
	env: NodeJS.ProcessEnv,
	timeoutMs: number
): Promise<RunResult> {
	return new Promise((resolve) => {
		const child = spawn(cmd, args, { env, stdio: ['ignore', 'pipe', 'pipe'], detached: true });
		running.add(child);
		let output = '';
		const keep = (chunk: Buffer) => {
			// Only the tail matters for error reports; cap memory for chatty commands.
			output = (output + chunk.toString()).slice(-20_000);
		};
		child.stdout?.on('data', keep);
		child.stderr?.on('data', keep);
		const timer = setTimeout(() => {
			output += `\n[bench] ${cmd} ${args.join(' ')} timed out after ${timeoutMs} ms`;
			signal(child, 'SIGTERM');
		}, timeoutMs);
		child.on('error', (err) => {
			output += `\n[bench] ${err.message}`;
		});
		child.on('close', (code) => {
			clearTimeout(timer);
			running.delete(child);
			resolve({ code: code ?? 1, output });
		});
	});
}

/** Like `run`, but throws with the command's last output when it fails. */
export async function must(
	cmd: string,
	args: string[],
	env: NodeJS.ProcessEnv,
	timeoutMs: number
): Promise<string> {
	const result = await run(cmd, args, env, timeoutMs);
	if (result.code !== 0) {
		throw new Error(
			`${cmd} ${args.join(' ')} failed (exit ${result.code}):\n${result.output.slice(-3000)}`
		);
	}
	return result.output;
}

/** Starts a long-running child (the app); the caller stops it with `stop`. */
export function startDetached(
	cmd: string,
	args: string[],
	env: NodeJS.ProcessEnv,
	logFd: number
): ChildProcess {
	const child = spawn(cmd, args, { env, stdio: ['ignore', logFd, logFd], detached: true });
	running.add(child);
	child.on('exit', () => running.delete(child));
	return child;
}

/** Ends one child by its handle and waits (bounded) for it to exit. */
export async function stop(child: ChildProcess, graceMs = 5000): Promise<void> {
	if (child.exitCode !== null || child.signalCode !== null) return;
	const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));
	signal(child, 'SIGTERM');
	const timer = new Promise<'late'>((resolve) => setTimeout(() => resolve('late'), graceMs));
	if ((await Promise.race([exited, timer])) === 'late') signal(child, 'SIGKILL');
}

/** Ends every child still running (used on error and on Ctrl-C). */
export async function stopAll(): Promise<void> {
	await Promise.all([...running].map((child) => stop(child)));
}

export const sleep = (ms: number) => new Promise<void>((resolve) => setTimeout(resolve, ms));

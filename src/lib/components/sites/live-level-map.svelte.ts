/**
 * Keeps the level map in step with the desk without blocking it: every change asks for a map, at most
 * one is computed per animation frame (the latest asked for), in the browser, with no page reload.
 */
import { computeLevelMap, type LevelMap, type LevelMapInput } from '$lib/sites/level-map';

export class LiveLevelMap {
	/** Raw state: the map holds thousands of vertices that need no deep reactivity. */
	map = $state.raw<LevelMap | null>(null);
	error = $state<string | null>(null);
	/** Maps computed so far and the time the last one took (shown to tests and curious engineers). */
	updates = $state(0);
	lastMs = $state(0);
	#pending: LevelMapInput | null = null;
	#frame = 0;

	request(input: LevelMapInput | null): void {
		this.#pending = input;
		if (!input) {
			this.map = null;
			this.error = null;
			return;
		}
		if (this.#frame) return;
		this.#frame = requestAnimationFrame(() => this.#run());
	}

	#run(): void {
		this.#frame = 0;
		const input = this.#pending;
		if (!input) return;
		this.#pending = null;
		const started = performance.now();
		try {
			this.map = computeLevelMap(input);
			this.error = null;
		} catch (e) {
			// The model refuses some packages outright (e.g. a load below the amplifier's minimum).
			this.map = null;
			this.error = e instanceof Error ? e.message : String(e);
		}
		this.lastMs = performance.now() - started;
		this.updates += 1;
	}

	destroy(): void {
		if (this.#frame) cancelAnimationFrame(this.#frame);
		this.#frame = 0;
		this.#pending = null;
	}
}

import { fetchEvaluations, type EvaluationResponse } from '$lib/api/evaluations';

/**
 * Re-evaluates the request as the desk types: debounced, one call in flight (a newer edit aborts
 * the older call), the last good answer kept on screen while a new one is pending or invalid.
 */
export class LiveEvaluation {
	response = $state<EvaluationResponse | null>(null);
	pending = $state(false);
	problem = $state<string | null>(null);
	fieldErrors = $state<Record<string, string[]>>({});
	/** True while the shown results belong to an earlier version of the request. */
	stale = $state(false);

	#timer: ReturnType<typeof setTimeout> | undefined;
	#controller: AbortController | undefined;
	#lastBody = '';

	constructor(private readonly delayMs = 300) {}

	request(body: Record<string, unknown>): void {
		const key = JSON.stringify(body);
		if (key === this.#lastBody) return;
		this.#lastBody = key;
		this.stale = this.response !== null;
		clearTimeout(this.#timer);
		this.#timer = setTimeout(() => void this.#run(body), this.delayMs);
	}

	async #run(body: Record<string, unknown>): Promise<void> {
		this.#controller?.abort();
		const controller = new AbortController();
		this.#controller = controller;
		this.pending = true;
		try {
			const result = await fetchEvaluations(body, controller.signal);
			if (controller.signal.aborted) return;
			if (result.ok) {
				this.response = result.data;
				this.fieldErrors = {};
				this.problem = null;
				this.stale = false;
			} else {
				this.fieldErrors = result.errors;
				this.problem = result.status === 422 ? 'Some fields need attention before the packages can be checked.' : result.message;
			}
		} catch (err) {
			if ((err as Error).name === 'AbortError') return;
			this.problem = 'Could not reach Throwline to check the packages. The last results stay on screen.';
		} finally {
			if (this.#controller === controller) this.pending = false;
		}
	}

	/** The live error for a request field, by the API's path (e.g. "boundary.distance"). */
	errorFor(path: string): string | undefined {
		return this.fieldErrors[path]?.[0];
	}

	dispose(): void {
		clearTimeout(this.#timer);
		this.#controller?.abort();
	}
}

/** What the fault world (world.ts) hands to the tests through vitest's provide/inject. */
import { inject } from 'vitest';

export interface WorldInfo {
	/** The app under test, e.g. http://127.0.0.1:3400. */
	origin: string;
	/** The world's full environment: run the scripts (db.sh, fakes.sh) with it. */
	env: Record<string, string>;
	/** The SMTP sink's read API. */
	mailApi: string;
	/** The Stripe stand-in (API and /_fake controls). */
	stripeApi: string;
}

declare module 'vitest' {
	export interface ProvidedContext {
		faultsWorld: WorldInfo;
	}
}

export function world(): WorldInfo {
	return inject('faultsWorld');
}

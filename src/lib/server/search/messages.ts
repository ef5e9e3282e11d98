/** What the request thread and the search worker say to each other (structured-clone plain data). */
import type { QuoteRequest } from '$lib/acoustics';
import type { SearchResult, StockCatalogue } from '$lib/systems';

export interface SearchJob {
	id: number;
	catalogue: StockCatalogue;
	request: QuoteRequest;
	/** Wall-clock time (ms since the epoch, shared by every thread) at which the search stops. */
	deadlineAt: number;
}

export type SearchMessage = { id: number; progress: number } | { id: number; result: SearchResult };

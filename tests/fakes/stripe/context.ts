// What every API handler receives, and the shape of a route.
import type { EventBus, RequestInfo } from './events';
import type { Params } from './form';
import type { Store } from './store';

export interface Deps {
	store: Store;
	events: EventBus;
	request: RequestInfo;
	/** This fake's own address, used for hosted invoice URLs. */
	baseUrl: string;
	accountName: string;
}

export interface ApiContext extends Deps {
	params: Params;
	/** Path captures, e.g. the invoice id of /v1/invoices/:id/finalize. */
	ids: string[];
}

export interface ApiResult {
	status?: number;
	body: unknown;
}

export interface Route {
	method: 'GET' | 'POST' | 'DELETE';
	pattern: RegExp;
	handler: (ctx: ApiContext) => ApiResult;
}

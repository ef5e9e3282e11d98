/**
 * One request per kind of entry point, each answered as an Observed status:
 *  - endpoints: the method with a body no schema accepts, so an allowed role gets 400, never a change;
 *  - page loads: the HTML page (what a person gets) and the page's own load alone through
 *    `__data.json`, so a layout's guard cannot hide a load that forgot its own;
 *  - actions: SvelteKit's JSON form-action protocol, which answers `{ type, status }`.
 */
import { BASE_URL } from '../browser';
import type { EntryPoint } from './routes';
import type { Observed } from './outcome';

/** Unreadable as JSON: every JSON route refuses it with 400 before it reads anything. */
export const UNREADABLE_JSON = '{';

function headersFor(
	cookie: string | undefined,
	extra: Record<string, string>
): Record<string, string> {
	return { origin: BASE_URL, ...(cookie ? { cookie } : {}), ...extra };
}

export async function endpoint(
	entry: EntryPoint,
	url: string,
	cookie: string | undefined,
	body = UNREADABLE_JSON
): Promise<Observed> {
	const hasBody = entry.method === 'POST' || entry.method === 'PATCH' || entry.method === 'PUT';
	const response = await fetch(`${BASE_URL}${url}`, {
		method: entry.method,
		redirect: 'manual',
		headers: headersFor(cookie, {
			accept: 'application/json',
			...(hasBody ? { 'content-type': 'application/json' } : {})
		}),
		body: hasBody ? body : undefined
	});
	const text = await response.text();
	return {
		status: response.status,
		location: response.headers.get('location'),
		detail: text.slice(0, 200)
	};
}

/** The page as a browser asks for it. */
export async function pageHtml(url: string, cookie: string | undefined): Promise<Observed> {
	const response = await fetch(`${BASE_URL}${url}`, {
		redirect: 'manual',
		headers: headersFor(cookie, { accept: 'text/html' })
	});
	await response.arrayBuffer();
	return { status: response.status, location: response.headers.get('location'), detail: '' };
}

interface DataNode {
	type: 'data' | 'skip' | 'error' | 'redirect';
	status?: number;
	location?: string;
	error?: { message?: string };
}

/** Runs only the load at `nodeIndex` of the page's chain (SvelteKit's client-side navigation request). */
export async function loadAlone(
	url: string,
	nodeIndex: number,
	cookie: string | undefined
): Promise<Observed> {
	const mask = '0'.repeat(nodeIndex) + '1';
	const dataUrl = `${url.replace(/\/$/, '')}/__data.json?x-sveltekit-invalidated=${mask}`;
	const response = await fetch(`${BASE_URL}${dataUrl}`, {
		redirect: 'manual',
		headers: headersFor(cookie, {})
	});
	const text = await response.text();
	let body: { type?: string; location?: string; nodes?: DataNode[]; status?: number };
	try {
		body = JSON.parse(text);
	} catch {
		return { status: response.status, location: null, detail: text.slice(0, 200) };
	}
	if (body.type === 'redirect')
		return { status: 303, location: body.location ?? null, detail: text.slice(0, 200) };
	const node = body.nodes?.[nodeIndex];
	if (!node)
		return {
			status: response.status >= 400 ? response.status : 599,
			location: null,
			detail: `no node ${nodeIndex}: ${text.slice(0, 200)}`
		};
	if (node.type === 'error')
		return { status: node.status ?? 500, location: null, detail: node.error?.message ?? '' };
	if (node.type === 'redirect') return { status: 303, location: node.location ?? null, detail: '' };
	if (node.type === 'skip')
		return { status: 599, location: null, detail: `node ${nodeIndex} was skipped` };
	return { status: 200, location: null, detail: '' };
}

/** A form action by SvelteKit's JSON protocol; `default` is posted to the bare page URL. */
export async function formAction(
	url: string,
	action: string,
	form: Record<string, string>,
	cookie: string | undefined
): Promise<Observed> {
	const target = action === 'default' ? url : `${url}?/${action}`;
	const response = await fetch(`${BASE_URL}${target}`, {
		method: 'POST',
		redirect: 'manual',
		headers: headersFor(cookie, {
			accept: 'application/json',
			'x-sveltekit-action': 'true',
			'content-type': 'application/x-www-form-urlencoded'
		}),
		body: new URLSearchParams(form)
	});
	const text = await response.text();
	let body: { type?: string; status?: number; location?: string };
	try {
		body = JSON.parse(text);
	} catch {
		return {
			status: response.status,
			location: response.headers.get('location'),
			detail: text.slice(0, 200)
		};
	}
	const status = body.type === 'error' ? response.status : (body.status ?? response.status);
	return { status, location: body.location ?? null, detail: text.slice(0, 200) };
}

/**
 * Finds every server entry point by reading src/routes at test time, so a new route cannot slip
 * past the route matrix: `+server.ts` methods, `+page.server.ts` loads and named actions, and
 * `+layout.server.ts` loads.
 */
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';

export const ROUTES_DIR = path.resolve('src/routes');

export type EntryKind = 'endpoint' | 'load' | 'layout' | 'action';

export interface EntryPoint {
	/** The matrix key: `GET /api/users`, `load /admin/users`, `layout /inventory`, `action /quotes/[id=id]?/send`. */
	key: string;
	kind: EntryKind;
	/** HTTP method for endpoints; POST for actions; GET for loads. */
	method: string;
	/** The route as SvelteKit sees it (groups dropped, params kept), e.g. `/quotes/[id=id]`. */
	route: string;
	/** Folder under src/routes, e.g. `(app)/quotes/[id=id]`. */
	dir: string;
	/** Actions only: the action's name (`default` for the unnamed one). */
	action?: string;
	/** Loads only: the position of this load in the page's chain of layouts (for `__data.json`). */
	nodeIndex?: number;
	/** Layout loads only: a page URL (route form) that runs under this layout. */
	pageRoute?: string;
}

function walk(dir: string): string[] {
	const files: string[] = [];
	for (const entry of readdirSync(dir, { withFileTypes: true })) {
		const full = path.join(dir, entry.name);
		if (entry.isDirectory()) files.push(...walk(full));
		else files.push(full);
	}
	return files;
}

/** `(app)/quotes/[id=id]` → `/quotes/[id=id]`: groups do not appear in URLs. */
export function routeOf(dir: string): string {
	const segments = dir.split('/').filter((s) => s && !/^\(.+\)$/.test(s));
	return '/' + segments.join('/');
}

function isLayoutDir(dir: string): boolean {
	const names = readdirSync(path.join(ROUTES_DIR, dir));
	return names.some((n) => /^\+layout(@[^.]*)?\.(svelte|ts|js|server\.ts|server\.js)$/.test(n));
}

/** The layout folders a page in `dir` renders inside, outermost first (the root always counts). */
function layoutChain(dir: string): string[] {
	const segments = dir ? dir.split('/') : [];
	let chain = [''];
	for (let i = 1; i <= segments.length; i++) {
		const prefix = segments.slice(0, i).join('/');
		if (isLayoutDir(prefix)) chain.push(prefix);
	}
	// `+page@.svelte` resets to the root layout, `+page@(app).svelte` to the named one.
	const reset = readdirSync(path.join(ROUTES_DIR, dir))
		.map((n) => /^\+page@([^.]*)\.svelte$/.exec(n))
		.find(Boolean);
	if (reset) {
		const target = reset[1];
		const keep = target === '' ? 1 : chain.findIndex((d) => d.split('/').pop() === target) + 1;
		chain = chain.slice(0, keep);
	}
	return chain;
}

const METHOD_EXPORT = /export\s+const\s+(GET|POST|PATCH|PUT|DELETE)\b/g;

/** The keys of `export const actions = { … }`, read from the source text. */
export function actionNames(text: string): string[] {
	const source = text.replace(/\/\*[\s\S]*?\*\//g, '').replace(/\/\/[^\n]*/g, '');
	const start = source.search(/export\s+const\s+actions\b[^=]*=\s*\{/);
	if (start < 0) return [];
	const open = source.indexOf('{', source.indexOf('=', start));
	const names: string[] = [];
	let depth = 0;
	let token = '';
	for (let i = open; i < source.length; i++) {
		const c = source[i];
		if (c === '{' || c === '(' || c === '[') depth++;
		else if (c === '}' || c === ')' || c === ']') {
			depth--;
			if (depth === 0) break;
		}
		if (depth === 1) {
			if (c === ':' && token.trim()) names.push(token.trim().replace(/^['"]|['"]$/g, ''));
			token = c === ',' || c === '{' || c === ':' ? '' : token + c;
			if (c === '\n') token = '';
		}
	}
	return names.filter((n) => /^[\w-]+$/.test(n));
}

export function discoverEntryPoints(): EntryPoint[] {
	const files = walk(ROUTES_DIR).map((f) => path.relative(ROUTES_DIR, f).split(path.sep).join('/'));
	const pageDirs = files
		.filter((f) => /(^|\/)\+page(@[^.]*)?\.svelte$/.test(f))
		.map((f) => path.posix.dirname(f).replace(/^\.$/, ''));
	const entries: EntryPoint[] = [];
	for (const file of files) {
		const dir = path.posix.dirname(file).replace(/^\.$/, '');
		const route = routeOf(dir);
		const source = readFileSync(path.join(ROUTES_DIR, file), 'utf8');
		const base = path.posix.basename(file);
		if (base === '+server.ts') {
			for (const [, method] of source.matchAll(METHOD_EXPORT)) {
				entries.push({ key: `${method} ${route}`, kind: 'endpoint', method, route, dir });
			}
		} else if (base === '+page.server.ts') {
			if (/export\s+const\s+load\b/.test(source)) {
				entries.push({
					key: `load ${route}`,
					kind: 'load',
					method: 'GET',
					route,
					dir,
					nodeIndex: layoutChain(dir).length
				});
			}
			for (const action of actionNames(source)) {
				entries.push({
					key: `action ${route}?/${action}`,
					kind: 'action',
					method: 'POST',
					route,
					dir,
					action
				});
			}
		} else if (base === '+layout.server.ts' && /export\s+const\s+load\b/.test(source)) {
			// Exercised through the nearest page under it, with only this layout's load asked for.
			const page = pageDirs
				.filter(
					(p) =>
						(dir === '' || p === dir || p.startsWith(`${dir}/`)) && layoutChain(p).includes(dir)
				)
				.sort((a, b) => routeOf(a).length - routeOf(b).length || a.localeCompare(b))[0];
			if (!page) throw new Error(`no page runs under the layout in ${dir}`);
			const nodeIndex = layoutChain(page).indexOf(dir);
			entries.push({
				key: `layout ${route}`,
				kind: 'layout',
				method: 'GET',
				route,
				dir,
				nodeIndex,
				pageRoute: routeOf(page)
			});
		}
	}
	return entries.sort((a, b) => a.key.localeCompare(b.key));
}

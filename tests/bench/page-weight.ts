/**
 * JavaScript a browser must fetch to show a page: every /_app/immutable/…js the page names (script
 * src, import("…") in SvelteKit's inline start script, modulepreload links — SvelteKit sends those
 * as a `link` response header, so both the header and the HTML are read), plus the static imports
 * of those modules, followed recursively. Dynamic import("…") inside modules is NOT followed:
 * it loads later (another page, a lazy widget), so it is not part of showing this page.
 * Sizes are gzip (node:zlib, default level) of each module, summed once per unique module.
 */
import { gzipSync } from 'node:zlib';

export interface PageWeight {
	path: string;
	finalPath: string;
	role: string;
	modules: number;
	/** SvelteKit node ids the page boots with whose module was not found (should be empty). */
	missingNodes: number[];
	rawKb: number;
	gzipKb: number;
}

interface ModuleInfo {
	raw: number;
	gzip: number;
	imports: string[];
}

const MAX_MODULES = 1000; // bound on the crawl, far above any real page
const MAX_REDIRECTS = 3;

const fromHtml = /["'`]([^"'`\s]*_app\/immutable\/[^"'`\s]+\.js)["'`]/g;
// `import{a as b}from"./x.js"`, `import"./x.js"`, `export*from"./x.js"` — never `import("…")`,
// because the bindings part may not contain a parenthesis.
const staticImport =
	/(?:^|[;\s}])(?:import|export)\s*(?:[^'"`;()]*?\bfrom\s*)?["']([^"']+\.js)["']/g;

// `<./_app/immutable/nodes/3.x.js>; rel="modulepreload"` entries of the link header.
const fromLinkHeader = /<([^>]*_app\/immutable\/[^>]+\.js)>\s*;[^,]*rel="?modulepreload"?/g;

const cache = new Map<string, Promise<ModuleInfo>>();

async function loadModule(url: string): Promise<ModuleInfo> {
	let info = cache.get(url);
	if (!info) {
		info = (async () => {
			const res = await fetch(url, { signal: AbortSignal.timeout(10_000) });
			if (!res.ok) throw new Error(`GET ${url} → ${res.status}`);
			const body = Buffer.from(await res.arrayBuffer());
			const text = body.toString('utf8');
			const imports = [...text.matchAll(staticImport)].map((m) => new URL(m[1], url).href);
			return { raw: body.length, gzip: gzipSync(body).length, imports };
		})();
		cache.set(url, info);
	}
	return info;
}

/** GETs a page as HTML with the given cookie, following (a bounded number of) redirects by hand. */
async function fetchPage(
	origin: string,
	path: string,
	cookie: string
): Promise<{ html: string; link: string; url: string }> {
	let url = new URL(path, origin).href;
	for (let hop = 0; hop <= MAX_REDIRECTS; hop++) {
		const res = await fetch(url, {
			redirect: 'manual',
			headers: { accept: 'text/html', ...(cookie ? { cookie } : {}) },
			signal: AbortSignal.timeout(10_000)
		});
		const location = res.headers.get('location');
		if (res.status >= 300 && res.status < 400 && location) {
			await res.arrayBuffer();
			url = new URL(location, url).href;
			if (new URL(url).origin !== origin) throw new Error(`${path} redirected off-site to ${url}`);
			continue;
		}
		if (res.status !== 200) throw new Error(`GET ${path} → ${res.status}`);
		return { html: await res.text(), link: res.headers.get('link') ?? '', url };
	}
	throw new Error(`GET ${path}: more than ${MAX_REDIRECTS} redirects`);
}

export async function pageWeight(
	origin: string,
	path: string,
	role: string,
	cookie: string
): Promise<PageWeight> {
	const page = await fetchPage(origin, path, cookie);
	const named = [...page.html.matchAll(fromHtml), ...page.link.matchAll(fromLinkHeader)].map(
		(m) => m[1]
	);
	const queue = [...new Set(named.map((ref) => new URL(ref, page.url).href))];
	const seen = new Set<string>();
	let raw = 0;
	let gzip = 0;
	while (queue.length > 0 && seen.size < MAX_MODULES) {
		const url = queue.shift()!;
		if (seen.has(url)) continue;
		if (new URL(url).origin !== origin) continue; // only the app's own modules
		seen.add(url);
		const info = await loadModule(url);
		raw += info.raw;
		gzip += info.gzip;
		for (const next of info.imports) if (!seen.has(next)) queue.push(next);
	}
	if (seen.size === 0) throw new Error(`${path}: no /_app/immutable JavaScript found in the page`);
	// Cross-check: the route's own modules (kit.start's node_ids) must be among those counted.
	const ids =
		/node_ids:\s*\[([\d,\s]*)\]/
			.exec(page.html)?.[1]
			.split(',')
			.map((n) => Number(n.trim())) ?? [];
	const urls = [...seen];
	const missingNodes = ids.filter((id) => !urls.some((u) => u.includes(`/nodes/${id}.`)));
	return {
		path,
		finalPath: new URL(page.url).pathname,
		role,
		modules: seen.size,
		missingNodes,
		rawKb: raw / 1024,
		gzipKb: gzip / 1024
	};
}

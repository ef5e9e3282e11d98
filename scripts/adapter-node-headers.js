import { readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import adapter from '@sveltejs/adapter-node';
import { nodeResolve } from '@rollup/plugin-node-resolve';
import { rollup } from 'rollup';
import { SECURITY_HEADERS } from '../src/lib/server/security-headers.js';

/**
 * adapter-node, plus the security headers on every answer of the built server. Its static files
 * (/_app/immutable/…, favicon) are served before SvelteKit's hooks run, so the hooks alone cannot
 * reach them: a tiny middleware in front of its handler sets the headers first (SvelteKit's own
 * answers still set theirs, e.g. a page's Content-Security-Policy).
 * @param {Parameters<typeof adapter>[0] & { out: string }} options
 * @returns {import('@sveltejs/kit').Adapter}
 */
export default function adapterNodeWithHeaders(options) {
	const node = adapter(options);
	return {
		...node,
		name: 'adapter-node-with-security-headers',
		async adapt(builder) {
			await node.adapt(builder);
			const entry = path.join(options.out, 'index.js');
			const source = readFileSync(entry, 'utf8');
			const anchor = '.use(handler)';
			if (!source.includes(anchor)) throw new Error(`adapter-node-headers: ${anchor} not found in ${entry}`);
			const middleware = `((headers) => (req, res, next) => { for (const [name, value] of Object.entries(headers)) res.setHeader(name, value); next(); })(${JSON.stringify(SECURITY_HEADERS)})`;
			writeFileSync(entry, source.replace(anchor, `.use(${middleware}, handler)`));
			await bundleSearchWorker(builder.getServerDirectory(), options.out);
		}
	};
}

/**
 * The suggestion search's worker thread (src/lib/server/search/search-worker.ts), emitted by the
 * server build as its own entry (vite.config.ts), as one file beside the app's server code:
 * adapter-node bundles only what its entries import, and a worker is started by path, not imported.
 * @param {string} serverDir the Vite server output
 * @param {string} out the build folder
 */
async function bundleSearchWorker(serverDir, out) {
	const pkg = JSON.parse(readFileSync('package.json', 'utf8'));
	const bundle = await rollup({
		input: path.join(serverDir, 'search-worker.js'),
		external: [/^node:/, ...Object.keys(pkg.dependencies || {}).map((d) => new RegExp(`^${d}(\\/.*)?$`))],
		plugins: [nodeResolve({ preferBuiltins: true, exportConditions: ['node'] })]
	});
	await bundle.write({ file: path.join(out, 'server', 'search-worker.js'), format: 'esm', inlineDynamicImports: true });
	await bundle.close();
}

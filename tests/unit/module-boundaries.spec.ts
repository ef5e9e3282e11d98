/**
 * Where code may reach: services hold business rules and know nothing of SvelteKit (the http layer,
 * src/lib/server/http/, maps their DomainErrors to answers), and pages and components take their
 * types from $lib, never from the server.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join, relative } from 'node:path';
import { describe, expect, it } from 'vitest';

const ROOT = join(import.meta.dirname, '../..');

function filesUnder(dir: string, keep: (name: string) => boolean): string[] {
	return readdirSync(join(ROOT, dir), { recursive: true, withFileTypes: true })
		.filter((e) => e.isFile() && keep(e.name))
		.map((e) => relative(ROOT, join(e.parentPath, e.name)));
}

/** Every module a file imports or re-exports from, as written. */
function importsOf(file: string): string[] {
	const text = readFileSync(join(ROOT, file), 'utf8');
	return [...text.matchAll(/(?:\bfrom|\bimport)\s*\(?\s*['"]([^'"]+)['"]/g)].map((m) => m[1]);
}

function offenders(files: string[], refused: (specifier: string) => boolean): string[] {
	return files.flatMap((file) => importsOf(file).filter(refused).map((specifier) => `${file} → ${specifier}`));
}

describe('module boundaries', () => {
	it('services never import SvelteKit, superforms or the http layer', () => {
		const services = filesUnder('src/lib/server/services', (n) => n.endsWith('.ts'));
		expect(services.length).toBeGreaterThan(10);
		const refused = (s: string) =>
			s === '@sveltejs/kit' || s.startsWith('@sveltejs/kit/') || s.startsWith('sveltekit-superforms') || s.startsWith('$app/') || /(^|\/)http(\/|$)/.test(s);
		expect(offenders(services, refused)).toEqual([]);
	});

	it('pages and components take their types from $lib, not from the server', () => {
		const pages = [
			...filesUnder('src/routes', (n) => n.endsWith('.svelte') || n.endsWith('.svelte.ts')),
			...filesUnder('src/lib/components', (n) => n.endsWith('.svelte') || n.endsWith('.ts')),
			...filesUnder('src/lib/api', (n) => n.endsWith('.ts'))
		];
		expect(pages.length).toBeGreaterThan(10);
		expect(offenders(pages, (s) => s.startsWith('$lib/server') || s.includes('/server/'))).toEqual([]);
	});
});

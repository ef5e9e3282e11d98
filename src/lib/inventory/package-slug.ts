/**
 * A package's slug made from its name ("Big Top — 2 × 4 subs" → "big-top-2-4-subs"), for a package
 * saved from a quote's system, where nobody types one. Same rules as the package form's slug.
 */
export function slugFromName(name: string, fallback = 'package'): string {
	const slug = name
		.normalize('NFKD')
		.replace(/[\u0300-\u036f]/g, '')
		.toLowerCase()
		.replace(/[^a-z0-9]+/g, '-')
		.replace(/^-+|-+$/g, '')
		.slice(0, 72)
		.replace(/-+$/, '');
	return slug.length >= 2 ? slug : fallback;
}

/** The slug with a numbered ending when the plain one is taken: "big-top", "big-top-2", … */
export function freeSlug(slug: string, taken: ReadonlySet<string>): string {
	if (!taken.has(slug)) return slug;
	for (let n = 2; ; n++) if (!taken.has(`${slug}-${n}`)) return `${slug}-${n}`;
}

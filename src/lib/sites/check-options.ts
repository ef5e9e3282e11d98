import type { PackageSpec, Programme } from '../acoustics';

/** What the site page needs to predict in the browser: package specs, programmes, the margin. */
export interface SiteCheckOptions {
	packages: { id: number; name: string; spec: PackageSpec }[];
	programmes: { slug: string; name: string; programme: Programme }[];
	defaultMarginDb: number;
}

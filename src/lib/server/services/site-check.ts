/**
 * What the site page needs to predict in the browser: every active package's model spec and the
 * programme profiles. The acoustic model is pure, so the page evaluates as the desk drags.
 */
import { toPackageSpec } from '$lib/inventory';
import { CATALOGUE, cached } from '../cache';
import { loadedPackages } from './catalogue';
import { listProgrammes, toProgramme } from './programmes';
import { getSettings } from './settings';

import type { SiteCheckOptions } from '$lib/sites/check-options';

export async function siteCheckOptions(): Promise<SiteCheckOptions> {
	const [packages, programmes, settings] = await Promise.all([
		cached(`${CATALOGUE}active-packages`, () => loadedPackages({ activeOnly: true })),
		listProgrammes(),
		getSettings()
	]);
	const specs: SiteCheckOptions['packages'] = [];
	for (const p of packages) {
		try {
			specs.push({ id: p.id, name: p.name, spec: toPackageSpec(p) });
		} catch {
			// A package the model cannot take (e.g. a line-array element without a height) is left out here;
			// the quote desk names the reason.
		}
	}
	return {
		packages: specs,
		programmes: programmes.map((p) => ({ slug: p.slug, name: p.name, programme: toProgramme(p) })),
		defaultMarginDb: settings.defaultMarginDb
	};
}

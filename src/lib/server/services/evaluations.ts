import { MODEL_ASSUMPTIONS, type QuoteRequest } from '$lib/acoustics';
import type { LoadedPackage } from '$lib/inventory/types';
import { evaluatePackages, type PackageResult } from '$lib/quotes/evaluate-packages';
import { toModelRequest } from '$lib/quotes/request';
import type { QuoteRequestInput } from '$lib/schemas/evaluation';
import type { SiteSnapshot } from '$lib/schemas/sites';
import { CATALOGUE, BOOKINGS, cached } from '../cache';
import { loadedPackages, reservationsOverlapping, unitsInService } from './catalogue';
import { DomainError } from './errors';
import { findProgramme, toProgramme } from './programmes';
import { getSettings, priceSettingsOf } from './settings';
import { findSite, snapshotOf } from './sites';

export interface DeskEvaluation {
	request: QuoteRequest;
	results: PackageResult[];
	assumptions: string[];
	/** The site evaluated (a saved site as it is now, or the one entered); null without a site. */
	site: SiteSnapshot | null;
	currency: string;
}

/**
 * The site a request names: a saved one as it is now, or the one entered with it. An unknown
 * saved site is a field error on `siteId` (422), like an unknown programme.
 */
export async function resolveSite(input: Pick<QuoteRequestInput, 'siteId' | 'site'>): Promise<SiteSnapshot | null> {
	if (input.siteId !== undefined) {
		const row = await findSite(input.siteId);
		if (!row) throw new DomainError(422, 'Unknown site.', { siteId: ['Choose one of the saved sites'] });
		return snapshotOf(row);
	}
	return input.site ? { ...input.site, siteId: null } : null;
}

/**
 * Evaluates every active package in stock against an organiser's request, ranked for the desk.
 * `options.packages` evaluates those (e.g. a composed system) instead of the stored packages.
 * `options.site` evaluates against a given snapshot instead of resolving the request's site.
 */
export async function evaluateForDesk(
	input: QuoteRequestInput,
	options: { packageIds?: number[]; packages?: LoadedPackage[]; excludeQuoteId?: number; site?: SiteSnapshot | null } = {}
): Promise<DeskEvaluation> {
	const [settings, programmeRow, packages, inService, reservations, site] = await Promise.all([
		getSettings(),
		findProgramme(input.programme),
		options.packages ?? loadedPackages({ activeOnly: true, ids: options.packageIds }),
		// Read through the short-lived cache: the desk asks again on every keystroke. Reserving stock
		// never uses these; it reads under row locks (bookings.ts).
		cached(`${CATALOGUE}units`, () => unitsInService()),
		cached(`${BOOKINGS}${input.startDate}:${input.endDate}:${options.excludeQuoteId ?? ''}`, () =>
			reservationsOverlapping(input.startDate, input.endDate, { excludeQuoteId: options.excludeQuoteId })
		),
		options.site !== undefined ? Promise.resolve(options.site) : resolveSite(input)
	]);
	if (!programmeRow) {
		throw new DomainError(422, 'Unknown programme profile.', { programme: ['Choose one of the programme profiles'] });
	}
	const request = toModelRequest(input, toProgramme(programmeRow), settings.defaultMarginDb, site);
	const results = evaluatePackages(packages, {
		request,
		startDate: input.startDate,
		endDate: input.endDate,
		priceSettings: priceSettingsOf(settings),
		inService,
		reservations
	});
	return { request, results, assumptions: MODEL_ASSUMPTIONS, site, currency: settings.currency };
}

/**
 * Suggest systems from stock for a request: loads the models, the units free on the dates and the
 * site, runs the pure search in a worker thread (src/lib/server/search), and prices each system
 * like a package.
 */
import type { QuoteRequestInput } from '$lib/schemas/evaluation';
import { reservedOn, type ModelKey } from '$lib/quotes/availability';
import { toModelRequest } from '$lib/quotes/request';
import { searchBudgetMs, type GroupPattern, type StockCatalogue } from '$lib/systems';
import type { LoadedPackage } from '$lib/inventory';
import { obstacleLines, presentSystems, type Suggestions } from '$lib/systems/present';
import { BOOKINGS, CATALOGUE, cached } from '../cache';
import { claimSearch } from '../search/run-search';
import { reservationsOverlapping, unitsInService } from './catalogue';
import { DomainError } from './errors';
import { resolveSite } from './evaluations';
import { amplifiers } from './inventory-amplifiers';
import { listLoadedPackages } from './inventory-packages';
import { loudspeakers } from './inventory-loudspeakers';
import { findProgramme, toProgramme } from './programmes';
import { getSettings, priceSettingsOf } from './settings';

export interface SuggestionSearch {
	/** Runs the search (once) and answers; `onProgress` hears the count of systems checked so far. */
	answer(onProgress?: (evaluated: number) => void): Promise<Suggestions>;
}

/**
 * Reads what the search needs and takes a place for it: a bad request (422) or a busy process
 * (503, `SearchBusyError`) is refused here, before any answer has started.
 */
export async function beginSuggestions(input: QuoteRequestInput, options: { budgetMs?: number } = {}): Promise<SuggestionSearch> {
	const [settings, programmeRow, speakerRows, ampRows, inService, reservations, site, packages] = await Promise.all([
		getSettings(),
		findProgramme(input.programme),
		loudspeakers.list(),
		amplifiers.list(),
		cached(`${CATALOGUE}units`, () => unitsInService()),
		cached(`${BOOKINGS}${input.startDate}:${input.endDate}:`, () => reservationsOverlapping(input.startDate, input.endDate)),
		resolveSite(input),
		cached(`${CATALOGUE}packages`, listLoadedPackages)
	]);
	if (!programmeRow) throw new DomainError(422, 'Unknown programme profile.', { programme: ['Choose one of the programme profiles'] });
	const request = toModelRequest(input, toProgramme(programmeRow), settings.defaultMarginDb, site);
	const reserved = reservedOn(reservations, input.startDate, input.endDate);
	const available: StockCatalogue['available'] = {};
	for (const [key, n] of Object.entries(inService) as [ModelKey, number][]) available[key] = Math.max(0, n - (reserved[key] ?? 0));
	const groupPatterns = groupPatternsOf(packages);
	const catalogue: StockCatalogue = { loudspeakers: speakerRows, amplifiers: ampRows, available, groupPatterns };
	const patterns = Object.values(groupPatterns).flat() as GroupPattern[];
	// The budget grows with the models in stock on the dates: the search space, not the whole inventory.
	const inStock = Object.values(available).filter((n) => (n ?? 0) > 0).length;
	const search = claimSearch(options.budgetMs ?? searchBudgetMs(inStock));
	const ctx = { request, startDate: input.startDate, endDate: input.endDate, priceSettings: priceSettingsOf(settings), inService, reservations };

	return {
		async answer(onProgress) {
			const found = await search(catalogue, request, onProgress);
			return {
				systems: presentSystems(found.clear, ctx, patterns),
				closest: found.clear.length > 0 ? [] : presentSystems(found.closest, ctx, patterns),
				complete: found.complete,
				evaluated: found.evaluated,
				obstacles: obstacleLines(found.obstacles, input.weighting),
				currency: settings.currency
			};
		}
	};
}

/** The house's group patterns for subwoofers (e.g. cardioid arrangements), once each, by model. */
function groupPatternsOf(packages: readonly LoadedPackage[]): Partial<Record<number, GroupPattern[]>> {
	const byModel: Partial<Record<number, GroupPattern[]>> = {};
	const seen = new Set<string>();
	for (const pkg of packages)
		for (const g of pkg.groups) {
			if (!g.directivity || g.loudspeaker.kind !== 'subwoofer') continue;
			const key = `${g.loudspeakerModelId}:${JSON.stringify(g.directivity)}`;
			if (seen.has(key)) continue;
			seen.add(key);
			(byModel[g.loudspeakerModelId] ??= []).push({ directivity: g.directivity, from: pkg.name });
		}
	return byModel;
}

export async function suggestForDesk(input: QuoteRequestInput, options: { budgetMs?: number; onProgress?: (n: number) => void } = {}): Promise<Suggestions> {
	return (await beginSuggestions(input, options)).answer(options.onProgress);
}

/**
 * Suggest systems from stock for a request: loads the models, the units free on the dates and the
 * site, runs the pure search in slices that yield to the event loop (so the app stays responsive),
 * and prices each system like a package.
 */
import type { QuoteRequestInput } from '$lib/schemas/evaluation';
import { reservedOn, type ModelKey } from '$lib/quotes/availability';
import { toModelRequest } from '$lib/quotes/request';
import { searchSystems, type SearchResult, type StockCatalogue } from '$lib/systems';
import { obstacleLines, presentSystems, type Suggestions } from '$lib/systems/present';
import { BOOKINGS, CATALOGUE, cached } from '../cache';
import { reservationsOverlapping, unitsInService } from './catalogue';
import { DomainError } from './errors';
import { resolveSite } from './evaluations';
import { amplifiers } from './inventory-amplifiers';
import { loudspeakers } from './inventory-loudspeakers';
import { findProgramme, toProgramme } from './programmes';
import { getSettings, priceSettingsOf } from './settings';

/** How long one slice of the search runs before it lets other requests in. */
const SLICE_MS = 8;

async function runSliced(steps: Generator<number, SearchResult>, onProgress?: (evaluated: number) => void): Promise<SearchResult> {
	let sliceStart = Date.now();
	for (;;) {
		const step = steps.next();
		if (step.done) return step.value;
		onProgress?.(step.value);
		if (Date.now() - sliceStart >= SLICE_MS) {
			await new Promise((resolve) => setImmediate(resolve));
			sliceStart = Date.now();
		}
	}
}

export async function suggestForDesk(input: QuoteRequestInput, options: { budgetMs?: number; onProgress?: (n: number) => void } = {}): Promise<Suggestions> {
	const [settings, programmeRow, speakerRows, ampRows, inService, reservations, site] = await Promise.all([
		getSettings(),
		findProgramme(input.programme),
		loudspeakers.list(),
		amplifiers.list(),
		cached(`${CATALOGUE}units`, () => unitsInService()),
		cached(`${BOOKINGS}${input.startDate}:${input.endDate}:`, () => reservationsOverlapping(input.startDate, input.endDate)),
		resolveSite(input)
	]);
	if (!programmeRow) throw new DomainError(422, 'Unknown programme profile.', { programme: ['Choose one of the programme profiles'] });
	const request = toModelRequest(input, toProgramme(programmeRow), settings.defaultMarginDb, site);
	const reserved = reservedOn(reservations, input.startDate, input.endDate);
	const available: StockCatalogue['available'] = {};
	for (const [key, n] of Object.entries(inService) as [ModelKey, number][]) available[key] = Math.max(0, n - (reserved[key] ?? 0));
	const catalogue: StockCatalogue = { loudspeakers: speakerRows, amplifiers: ampRows, available };

	const found = await runSliced(searchSystems(catalogue, request, { budgetMs: options.budgetMs }), options.onProgress);
	const ctx = { request, startDate: input.startDate, endDate: input.endDate, priceSettings: priceSettingsOf(settings), inService, reservations };
	return {
		systems: presentSystems(found.clear, ctx),
		closest: found.clear.length > 0 ? [] : presentSystems(found.closest, ctx),
		complete: found.complete,
		evaluated: found.evaluated,
		obstacles: obstacleLines(found.obstacles),
		currency: settings.currency
	};
}

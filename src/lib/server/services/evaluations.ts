import { MODEL_ASSUMPTIONS, type QuoteRequest } from '$lib/acoustics';
import { evaluatePackages, type PackageResult } from '$lib/quotes/evaluate-packages';
import { toModelRequest } from '$lib/quotes/request';
import type { QuoteRequestInput } from '$lib/schemas/evaluation';
import { CATALOGUE, BOOKINGS, cached } from '../cache';
import { loadedPackages, reservationsOverlapping, unitsInService } from './catalogue';
import { DomainError } from './errors';
import { findProgramme, toProgramme } from './programmes';
import { getSettings, priceSettingsOf } from './settings';

export interface DeskEvaluation {
	request: QuoteRequest;
	results: PackageResult[];
	assumptions: string[];
	currency: string;
}

/** Evaluates every active package in stock against an organiser's request, ranked for the desk. */
export async function evaluateForDesk(
	input: QuoteRequestInput,
	options: { packageIds?: number[]; excludeQuoteId?: number } = {}
): Promise<DeskEvaluation> {
	const [settings, programmeRow, packages, inService, reservations] = await Promise.all([
		getSettings(),
		findProgramme(input.programme),
		loadedPackages({ activeOnly: true, ids: options.packageIds }),
		// Read through the short-lived cache: the desk asks again on every keystroke. Reserving stock
		// never uses these; it reads under row locks (bookings.ts).
		cached(`${CATALOGUE}units`, () => unitsInService()),
		cached(`${BOOKINGS}${input.startDate}:${input.endDate}:${options.excludeQuoteId ?? ''}`, () =>
			reservationsOverlapping(input.startDate, input.endDate, { excludeQuoteId: options.excludeQuoteId })
		)
	]);
	if (!programmeRow) {
		throw new DomainError(422, 'Unknown programme profile.', { programme: ['Choose one of the programme profiles'] });
	}
	const request = toModelRequest(input, toProgramme(programmeRow), settings.defaultMarginDb);
	const results = evaluatePackages(packages, {
		request,
		startDate: input.startDate,
		endDate: input.endDate,
		priceSettings: priceSettingsOf(settings),
		inService,
		reservations
	});
	return { request, results, assumptions: MODEL_ASSUMPTIONS, currency: settings.currency };
}

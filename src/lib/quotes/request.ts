/** Turns the desk's request (units as entered) into the acoustic model's QuoteRequest (metres). */
import type { Programme, QuoteRequest } from '../acoustics';
import { toMetres } from '../acoustics/units';
import type { QuoteRequestInput } from '../schemas/evaluation';
import type { InlineSiteInput } from '../schemas/sites';
import { toModelSite } from '../sites/model-site';

/** `site` is the resolved site (a saved one's current state, a snapshot, or the inline one). */
export function toModelRequest(
	input: QuoteRequestInput,
	programme: Programme,
	defaultMarginDb: number,
	site: InlineSiteInput | null = null
): QuoteRequest {
	return {
		...(site ? { site: toModelSite(site) } : {}),
		targetDb: input.targetDb,
		weighting: input.weighting,
		distanceM: toMetres(input.distance, input.distanceUnit),
		...(input.audienceWidth !== undefined ? { audienceWidthM: toMetres(input.audienceWidth, input.distanceUnit) } : {}),
		programme,
		air: { temperatureC: input.temperatureC, humidityPct: input.humidityPct },
		marginDb: input.marginDb ?? defaultMarginDb,
		...(input.boundary
			? {
					boundary: {
						distanceM: toMetres(input.boundary.distance, input.distanceUnit),
						limitDb: input.boundary.limitDb,
						weighting: input.boundary.weighting
					}
				}
			: {})
	};
}

/** Distances for the level-versus-distance chart: log-spaced from 1 m to past the farthest point of interest. */
export function chartDistances(request: QuoteRequest, points = 24): number[] {
	const receivers = request.site?.receivers.map((r) => Math.hypot(r.x, r.y)) ?? [];
	const farthest = Math.max(request.distanceM, request.boundary?.distanceM ?? 0, ...receivers) * 1.6;
	const end = Math.max(10, farthest);
	return Array.from({ length: points }, (_, i) => Number((end ** (i / (points - 1))).toFixed(3)));
}

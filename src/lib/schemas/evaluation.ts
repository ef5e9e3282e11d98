import { z } from 'zod';
import { hireDays, parseIsoDate } from '../quotes/hire-days';
import { MAX_HIRE_DAYS, localIsoDate } from '../quotes/hire-limits';
import { toMetres } from '../acoustics/units';
import { inlineSiteSchema } from './sites';

const weighting = z.enum(['A', 'C', 'Z'], { error: 'Choose A, C or Z weighting' });
const isoDate = z.string().refine((v) => parseIsoDate(v) !== null, 'A date as YYYY-MM-DD');
const finite = (min: number, max: number, what: string) =>
	z
		.number({ error: `Enter ${what} as a number` })
		.min(min, `${what[0].toUpperCase()}${what.slice(1)} must be at least ${min}`)
		.max(max, `${what[0].toUpperCase()}${what.slice(1)} must be at most ${max}`);

/**
 * An organiser's request as the desk and the API send it. Distances are in `distanceUnit`;
 * ranges are those of the methods used (ISO 9613-1 air absorption holds for −20…50 °C and
 * 10…100 % relative humidity) and of outdoor live sound.
 */
export const quoteRequestSchema = z
	.object({
		targetDb: finite(40, 140, 'the target level (dB)'),
		weighting,
		distance: finite(0.01, 10_000, 'the distance'),
		distanceUnit: z.enum(['m', 'ft']).default('m'),
		audienceWidth: finite(0.5, 10_000, 'the audience width').optional(),
		programme: z.string().trim().min(1, 'Choose a programme').max(40),
		temperatureC: finite(-20, 50, 'the temperature (°C)').default(20),
		humidityPct: finite(10, 100, 'the humidity (%)').default(50),
		marginDb: finite(0, 20, 'the safety margin (dB)').optional(),
		boundary: z
			.object({
				distance: finite(0.01, 20_000, 'the boundary distance'),
				limitDb: finite(20, 140, 'the boundary limit (dB)'),
				weighting
			})
			.optional(),
		/** A saved site, evaluated as it is now (the quote keeps a snapshot); or an on-the-fly one. */
		siteId: z.number({ error: 'Choose a saved site' }).int().positive('Choose a saved site').optional(),
		site: inlineSiteSchema.optional(),
		startDate: isoDate,
		endDate: isoDate
	})
	.superRefine((r, ctx) => {
		const metres = toMetres(r.distance, r.distanceUnit);
		if (metres < 1 || metres > 2000) {
			ctx.addIssue({ code: 'custom', path: ['distance'], message: 'The position must be 1 m to 2 km from the system' });
		}
		if (r.boundary) {
			const b = toMetres(r.boundary.distance, r.distanceUnit);
			if (b < 1 || b > 5000) {
				ctx.addIssue({ code: 'custom', path: ['boundary', 'distance'], message: 'The boundary must be 1 m to 5 km from the system' });
			}
		}
		if (r.siteId !== undefined && r.site !== undefined) {
			ctx.addIssue({ code: 'custom', path: ['siteId'], message: 'Choose a saved site or enter one, not both' });
		}
		if (r.startDate > r.endDate) {
			ctx.addIssue({ code: 'custom', path: ['endDate'], message: 'The hire cannot end before it starts' });
		} else if (parseIsoDate(r.startDate) !== null && parseIsoDate(r.endDate) !== null && hireDays(r.startDate, r.endDate) > MAX_HIRE_DAYS) {
			ctx.addIssue({ code: 'custom', path: ['endDate'], message: `A hire lasts at most ${MAX_HIRE_DAYS} days` });
		}
		// Read at validation time, so a long-running server never freezes "today".
		if (parseIsoDate(r.startDate) !== null && r.startDate < localIsoDate(new Date())) {
			ctx.addIssue({ code: 'custom', path: ['startDate'], message: 'The hire cannot start in the past' });
		}
	});
export type QuoteRequestInput = z.infer<typeof quoteRequestSchema>;


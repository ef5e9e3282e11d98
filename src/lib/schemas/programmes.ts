import { z } from 'zod';
import { PRICING_RULES } from '../quotes/pricing';

export const NOMINAL_BANDS = ['31.5', '63', '125', '250', '500', '1000', '2000', '4000', '8000'] as const;
export type NominalBandKey = (typeof NOMINAL_BANDS)[number];
/** Relative level per nominal octave band (any reference); a missing band is not needed. */
export type ProgrammeBands = Partial<Record<NominalBandKey, number>>;

const bandLevel = z.number().min(-60, 'Between −60 and +30 dB').max(30, 'Between −60 and +30 dB');

export const programmeSchema = z.object({
	slug: z
		.string()
		.trim()
		.min(2)
		.max(40)
		.regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, 'Lower-case letters, digits and dashes'),
	name: z.string().trim().min(2, 'Give it a name').max(80),
	description: z.string().trim().max(1000).default(''),
	bands: z
		.partialRecord(z.enum(NOMINAL_BANDS), bandLevel)
		.refine((b) => Object.keys(b).length > 0, 'Give a level for at least one band'),
	crestFactorDb: z.number().min(3, 'A crest factor is at least 3 dB (a sine)').max(30, 'At most 30 dB')
});
export type ProgrammeInput = z.infer<typeof programmeSchema>;

export const settingsSchema = z.object({
	companyName: z.string().trim().min(2, 'Enter the company name').max(160),
	currency: z
		.string()
		.trim()
		.toUpperCase()
		.regex(/^[A-Z]{3}$/, 'A three-letter ISO 4217 code, e.g. GBP, EUR, USD'),
	taxRatePct: z.number().min(0, '0 % or more').max(50, 'At most 50 %'),
	depositPct: z.number().min(0, '0 % or more').max(100, 'At most 100 %'),
	pricingRule: z.enum(PRICING_RULES),
	defaultMarginDb: z.number().min(0, '0 dB or more').max(20, 'At most 20 dB'),
	distanceUnit: z.enum(['m', 'ft']),
	paymentTermsDays: z.number().int().min(0).max(120),
	cancellationFullRefundDays: z.number().int().min(0).max(365),
	testIntervalDays: z.number().int('Whole days').min(1, 'At least 1 day').max(1825, 'At most 5 years (1825 days)').default(365),
	quoteValidityDays: z.number().int().min(1, 'At least 1 day').max(365, 'At most 365 days').default(30),
	companyAddress: z.string().trim().max(1000).default(''),
	companyTaxNumber: z.string().trim().max(60).default(''),
	companyContact: z.string().trim().max(200).default(''),
	salesDeskEmail: z.union([z.literal(''), z.string().trim().toLowerCase().max(254).pipe(z.email('Enter a valid e-mail address'))]).default('')
});
export type SettingsInput = z.infer<typeof settingsSchema>;

/** Flat form fields (one per band, empty = band not needed), so the form works without JavaScript. */
export const BAND_FIELDS = {
	'31.5': 'band31',
	'63': 'band63',
	'125': 'band125',
	'250': 'band250',
	'500': 'band500',
	'1000': 'band1k',
	'2000': 'band2k',
	'4000': 'band4k',
	'8000': 'band8k'
} as const satisfies Record<NominalBandKey, string>;

const optionalBand = bandLevel.nullable().default(null);

export const programmeFormSchema = programmeSchema
	.omit({ bands: true })
	.extend({
		band31: optionalBand,
		band63: optionalBand,
		band125: optionalBand,
		band250: optionalBand,
		band500: optionalBand,
		band1k: optionalBand,
		band2k: optionalBand,
		band4k: optionalBand,
		band8k: optionalBand
	})
	.refine((f) => NOMINAL_BANDS.some((b) => f[BAND_FIELDS[b]] !== null), {
		path: ['band1k'],
		message: 'Give a level for at least one band'
	});
export type ProgrammeFormInput = z.infer<typeof programmeFormSchema>;

export function programmeFromForm(form: ProgrammeFormInput): ProgrammeInput {
	const bands: ProgrammeBands = {};
	for (const band of NOMINAL_BANDS) {
		const level = form[BAND_FIELDS[band]];
		if (level !== null) bands[band] = level;
	}
	return { slug: form.slug, name: form.name, description: form.description, crestFactorDb: form.crestFactorDb, bands };
}

export function programmeToForm(p: ProgrammeInput): ProgrammeFormInput {
	const form = { slug: p.slug, name: p.name, description: p.description, crestFactorDb: p.crestFactorDb } as ProgrammeFormInput;
	for (const band of NOMINAL_BANDS) form[BAND_FIELDS[band]] = p.bands[band] ?? null;
	return form;
}

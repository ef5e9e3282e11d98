import { z } from 'zod';
import { QUOTE_ACTIONS } from '../quotes/states';
import { quoteRequestSchema, type QuoteRequestInput } from './evaluation';
import { systemSchema } from './systems';

export const newClientSchema = z.object({
	name: z.string().trim().min(2, 'Enter the organisation’s name').max(160),
	contactName: z.string().trim().min(2, 'Enter a contact name').max(120),
	email: z.string().trim().toLowerCase().max(254).pipe(z.email('Enter a valid e-mail address')),
	phone: z.string().trim().max(40).optional()
});

/** A quote offers one package or one system, never both and never neither. */
const onePackageOrSystem = (q: { packageId?: number; system?: unknown }) => (q.packageId === undefined) !== (q.system === undefined);
const choosePackage = { path: ['packageId'], message: 'Choose a package or a system' };

const quoteFields = {
	eventName: z.string().trim().min(2, 'Name the event').max(160),
	packageId: z.number().int().positive({ error: 'Choose a package' }).optional(),
	/** A system composed or suggested for this quote, instead of a package. */
	system: systemSchema.optional(),
	notes: z.string().trim().max(4000).optional(),
	request: quoteRequestSchema
};

/** API body for a new quote: an existing client by id, or a new one. */
export const quoteCreateSchema = z
	.object({
		clientId: z.number().int().positive().optional(),
		newClient: newClientSchema.optional(),
		...quoteFields
	})
	.refine((q) => (q.clientId === undefined) !== (q.newClient === undefined), {
		path: ['clientId'],
		message: 'Choose an existing client or enter a new one'
	})
	.refine(onePackageOrSystem, choosePackage);
export type QuoteCreateInput = z.infer<typeof quoteCreateSchema>;

/** A revision keeps the client; everything else may change. */
export const quoteReviseSchema = z.object(quoteFields).refine(onePackageOrSystem, choosePackage);
export type QuoteReviseInput = z.infer<typeof quoteReviseSchema>;

/**
 * A move on a quote. A client accepting must confirm the terms (`acceptTerms: true`); a change
 * request carries the client's message, a decline may.
 */
export const quoteActionSchema = z.object({
	action: z.enum(QUOTE_ACTIONS, { error: 'Unknown action' }),
	acceptTerms: z.boolean().optional(),
	message: z.string().trim().max(4000).optional()
});
export type QuoteActionInput = z.infer<typeof quoteActionSchema>;

// ---- The desk's request form: flat fields so it works without JavaScript and names map to inputs.

const optionalNumber = z.number().nullable().default(null);

export const quoteRequestFormSchema = z.object({
	clientId: z.number().int().positive().nullable().default(null),
	newClientName: z.string().trim().max(160).default(''),
	newClientContact: z.string().trim().max(120).default(''),
	newClientEmail: z.string().trim().max(254).default(''),
	eventName: z.string().trim().max(160).default(''),
	startDate: z.string().default(''),
	endDate: z.string().default(''),
	targetDb: z.number().default(100),
	weighting: z.enum(['A', 'C', 'Z']).default('A'),
	distance: z.number().default(30),
	distanceUnit: z.enum(['m', 'ft']).default('m'),
	audienceWidth: optionalNumber,
	programme: z.string().default('pop-rock'),
	temperatureC: z.number().default(20),
	humidityPct: z.number().default(50),
	marginDb: optionalNumber,
	boundaryEnabled: z.boolean().default(false),
	boundaryDistance: optionalNumber,
	boundaryLimitDb: optionalNumber,
	boundaryWeighting: z.enum(['A', 'C', 'Z']).default('A'),
	siteId: z.number().int().positive().nullable().default(null),
	notes: z.string().max(4000).default(''),
	packageId: z.number().int().positive().nullable().default(null),
	/** A chosen suggested or composed system, as JSON of its groups ('' when a package is chosen). */
	system: z.string().max(4000).default('')
});
export type QuoteRequestForm = z.infer<typeof quoteRequestFormSchema>;

/** The evaluation body the form describes (not yet validated). */
export function evaluationBodyFromForm(f: QuoteRequestForm): Record<string, unknown> {
	return {
		targetDb: f.targetDb,
		weighting: f.weighting,
		distance: f.distance,
		distanceUnit: f.distanceUnit,
		...(f.audienceWidth !== null ? { audienceWidth: f.audienceWidth } : {}),
		programme: f.programme,
		temperatureC: f.temperatureC,
		humidityPct: f.humidityPct,
		...(f.marginDb !== null ? { marginDb: f.marginDb } : {}),
		...(f.boundaryEnabled
			? { boundary: { distance: f.boundaryDistance, limitDb: f.boundaryLimitDb, weighting: f.boundaryWeighting } }
			: {}),
		...(f.siteId !== null ? { siteId: f.siteId } : {}),
		startDate: f.startDate,
		endDate: f.endDate
	};
}

/** Where an API error path lands in the flat form. */
export function formFieldOf(path: string): keyof QuoteRequestForm | null {
	const map: Record<string, keyof QuoteRequestForm> = {
		'boundary.distance': 'boundaryDistance',
		'boundary.limitDb': 'boundaryLimitDb',
		'boundary.weighting': 'boundaryWeighting',
		'request.boundary.distance': 'boundaryDistance',
		'request.boundary.limitDb': 'boundaryLimitDb',
		'newClient.name': 'newClientName',
		'newClient.contactName': 'newClientContact',
		'newClient.email': 'newClientEmail'
	};
	if (map[path]) return map[path];
	const last = path.replace(/^request\./, '');
	return last in quoteRequestFormSchema.shape ? (last as keyof QuoteRequestForm) : null;
}

/** The hidden system field back into groups; anything unreadable is left for the schema to refuse. */
function parseSystem(text: string): unknown {
	try {
		return JSON.parse(text);
	} catch {
		return { groups: [] };
	}
}

/** The request form as a quote body for the API (validated by quoteCreateSchema). */
export function quoteBodyFromForm(f: QuoteRequestForm): Record<string, unknown> {
	return {
		...(f.clientId !== null
			? { clientId: f.clientId }
			: { newClient: { name: f.newClientName, contactName: f.newClientContact, email: f.newClientEmail } }),
		eventName: f.eventName,
		...(f.system ? { system: parseSystem(f.system) } : { packageId: f.packageId ?? 0 }),
		...(f.notes ? { notes: f.notes } : {}),
		request: evaluationBodyFromForm(f)
	};
}

/** A saved request back into the form, for revising a quote. */
export function formFromRequest(request: QuoteRequestInput): Partial<QuoteRequestForm> {
	return {
		targetDb: request.targetDb,
		weighting: request.weighting,
		distance: request.distance,
		distanceUnit: request.distanceUnit,
		audienceWidth: request.audienceWidth ?? null,
		programme: request.programme,
		temperatureC: request.temperatureC,
		humidityPct: request.humidityPct,
		marginDb: request.marginDb ?? null,
		boundaryEnabled: request.boundary !== undefined,
		boundaryDistance: request.boundary?.distance ?? null,
		boundaryLimitDb: request.boundary?.limitDb ?? null,
		boundaryWeighting: request.boundary?.weighting ?? 'A',
		siteId: request.siteId ?? null,
		startDate: request.startDate,
		endDate: request.endDate
	};
}

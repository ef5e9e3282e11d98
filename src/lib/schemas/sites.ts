import { z } from 'zod';

/**
 * A site as the API, the forms and the evaluation request send it. Positions and heights are always
 * metres here (x east, y north of the system); `units` only says how the pages show them.
 */
export const GROUNDS = ['hard', 'mixed', 'porous', 'custom', 'none'] as const;
export type Ground = (typeof GROUNDS)[number];

const number = (min: number, max: number, what: string) =>
	z
		.number({ error: `Enter ${what} as a number` })
		.min(min, `${what[0].toUpperCase()}${what.slice(1)} must be at least ${min}`)
		.max(max, `${what[0].toUpperCase()}${what.slice(1)} must be at most ${max}`);

export const receiverSchema = z.object({
	name: z.string().trim().min(1, 'Name the receiver').max(80),
	x: number(-10_000, 10_000, 'the distance east (m)'),
	y: number(-10_000, 10_000, 'the distance north (m)'),
	heightM: number(0, 100, 'the receiver height (m)').default(1.5),
	limitDb: z
		.number({ error: 'Enter the receiver’s limit in dB' })
		.min(20, 'A limit must be at least 20 dB')
		.max(140, 'A limit must be at most 140 dB'),
	weighting: z.enum(['A', 'C', 'Z'], { error: 'Choose A, C or Z weighting' }).default('A'),
	/** A limit on one octave band, unweighted; null for a weighted overall limit. */
	bandHz: z
		.union([z.literal(63), z.literal(125)], { error: 'A band limit is at 63 or 125 Hz' })
		.nullable()
		.default(null),
	/** The averaging period as the licence states it, e.g. "15 min Leq". */
	period: z.string().trim().max(60).default(''),
	notes: z.string().trim().max(1000).default('')
});
export type ReceiverInput = z.infer<typeof receiverSchema>;

const siteFields = {
	name: z.string().trim().min(2, 'Name the site').max(120),
	address: z.string().trim().max(300).default(''),
	notes: z.string().trim().max(4000).default(''),
	ground: z.enum(GROUNDS, { error: 'Choose hard, mixed, porous, a G value or none' }).default('mixed'),
	/** ISO 9613-2 G; used (and required) only when ground is 'custom'. */
	groundFactor: number(0, 1, 'the ground factor G').nullable().default(null),
	aimDeg: number(0, 360, 'the aim bearing (°)').default(0),
	positionHeightM: number(0, 50, 'the position height (m)').default(1.5),
	allowanceDb: number(0, 20, 'the allowance (dB)').default(0),
	units: z.enum(['m', 'ft']).default('m'),
	receivers: z.array(receiverSchema).max(40, 'At most 40 receivers').default([])
};

type SiteShape = { ground: Ground; groundFactor: number | null; receivers: { name: string }[] };

function siteRules(site: SiteShape, ctx: z.RefinementCtx) {
	if (site.ground === 'custom' && site.groundFactor === null) {
		ctx.addIssue({ code: 'custom', path: ['groundFactor'], message: 'Enter G between 0 (hard) and 1 (porous)' });
	}
	const seen = new Set<string>();
	site.receivers.forEach((r, i) => {
		const key = r.name.trim().toLowerCase();
		if (seen.has(key)) {
			ctx.addIssue({ code: 'custom', path: ['receivers', i, 'name'], message: 'Each receiver needs its own name' });
		}
		seen.add(key);
	});
}

export const siteSchema = z.object(siteFields).superRefine(siteRules);
export type SiteInput = z.infer<typeof siteSchema>;

/** PATCH: any top-level field; receivers, when sent, replace the whole list. */
export const siteUpdateSchema = z
	.object(siteFields)
	.partial()
	.strict()
	.superRefine((s, ctx) => {
		if (s.ground === 'custom' && (s.groundFactor === null || s.groundFactor === undefined)) {
			ctx.addIssue({ code: 'custom', path: ['groundFactor'], message: 'Enter G between 0 (hard) and 1 (porous)' });
		}
		if (s.receivers) siteRules({ ground: 'none', groundFactor: null, receivers: s.receivers }, ctx);
	});
export type SiteUpdateInput = z.infer<typeof siteUpdateSchema>;

/** An on-the-fly site inside an evaluation request: a name is optional there. */
export const inlineSiteSchema = z
	.object({ ...siteFields, name: z.string().trim().max(120).default('Site entered with the request') })
	.superRefine(siteRules);
export type InlineSiteInput = z.infer<typeof inlineSiteSchema>;

/** The copy of a site a quote version keeps: what was evaluated, whatever happens to the site later. */
export type SiteSnapshot = InlineSiteInput & { siteId: number | null };

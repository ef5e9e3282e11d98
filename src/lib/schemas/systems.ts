import { z } from 'zod';
import { quoteRequestSchema } from './evaluation';
import { checkGroupsFit, packageFields, packageGroupSchema } from './inventory-packages';

/**
 * One group of a composed or suggested system, by model ids: a package group, with the group pattern
 * (e.g. subwoofers in a cardioid arrangement) a suggestion took from a package. Up to 64 cabinets a
 * stack, as the search may gather them from stock.
 */
export const systemGroupSchema = packageGroupSchema.extend({
	count: z.number({ error: 'Enter a number' }).int('Whole numbers only').min(1, 'At least 1').max(64, 'At most 64'),
	/** Left out, a line-array element is taken as flown. */
	flown: z.boolean().optional()
});

/** The same channel-plan rules as a package's groups (the database-free ones; the rest in loadSystem). */
export const systemSchema = z
	.object({
		groups: z.array(systemGroupSchema).min(1, 'A system needs at least one group').max(6, 'At most 6 groups')
	})
	.superRefine(checkGroupsFit);
export type SystemInput = z.output<typeof systemSchema>;

/** "Save as a package": the new package's name (unique) and an optional description. */
export const promoteSchema = z.object({
	name: packageFields.shape.name,
	description: packageFields.shape.description
});
export type PromoteInput = z.output<typeof promoteSchema>;

/**
 * POST /api/evaluations: the request, and optionally a system composed on the desk; with one, only
 * that system is evaluated (and priced) instead of every package.
 */
export const quoteRequestWithSystemSchema = z.intersection(quoteRequestSchema, z.object({ system: systemSchema.optional() }));

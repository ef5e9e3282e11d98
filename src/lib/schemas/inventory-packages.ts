import { z } from 'zod';
import { optionalDirectivitySchema } from './directivity';
import { measure, patchSchemaOf } from './inventory-common';

const id = z.number({ error: 'Choose one' }).int().positive('Choose one');
const wholeCount = (max: number) =>
	z.number({ error: 'Enter a number' }).int('Whole numbers only').min(1, 'At least 1').max(max, `At most ${max}`);

/** One group of a package: the GroupSpec of the acoustic model, by model ids. */
export const packageGroupSchema = z.object({
	loudspeakerModelId: id,
	count: wholeCount(48),
	stacks: wholeCount(16).default(1),
	amplifierModelId: id,
	cabinetsPerChannel: wholeCount(8),
	flown: z.boolean().default(false),
	/** Acoustic centre above ground (v2, used with a site); empty means the model's 1.5 m. */
	heightM: measure(0, 50, 'm').nullish(),
	/** Between the outermost stacks or hangs; empty means 0. */
	spacingM: measure(0, 200, 'm').nullish(),
	/** The arrangement's own pattern (e.g. cardioid subs), overriding the loudspeaker's table. */
	directivity: optionalDirectivitySchema
});

export const packageFields = z.object({
	name: z.string().trim().min(1, 'Enter a name').max(120, 'At most 120 characters'),
	slug: z
		.string()
		.trim()
		.toLowerCase()
		.min(2, 'At least 2 characters')
		.max(80, 'At most 80 characters')
		.regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, 'Lower-case letters, digits and single hyphens'),
	description: z.string().trim().max(2000, 'At most 2000 characters').default(''),
	active: z.boolean().default(true),
	groups: z.array(packageGroupSchema).min(1, 'A package needs at least one group of cabinets').max(20)
});

/**
 * Checks that need no database: a channel cannot carry more cabinets than the stack has. Shared by
 * packages and composed systems (the same channel-plan rules).
 */
export function checkGroupsFit(v: { groups: readonly { count: number; cabinetsPerChannel: number }[] }, ctx: z.RefinementCtx) {
	v.groups.forEach((g, i) => {
		if (g.cabinetsPerChannel > g.count) {
			ctx.addIssue({
				code: 'custom',
				path: ['groups', i, 'cabinetsPerChannel'],
				message: 'More cabinets per channel than the group has'
			});
		}
	});
}

export const packageSchema = packageFields.superRefine(checkGroupsFit);
export type PackageInput = z.output<typeof packageSchema>;

export const packagePatchSchema = patchSchemaOf(packageFields);
export type PackagePatch = z.output<typeof packagePatchSchema>;

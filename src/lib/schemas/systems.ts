import { z } from 'zod';
import { optionalDirectivitySchema } from './directivity';

/** One group of a composed or suggested system, by model ids (the same channel-plan rules as packages). */
export const systemGroupSchema = z.object({
	loudspeakerModelId: z.number().int().positive(),
	count: z.number().int().min(1).max(64),
	stacks: z.union([z.literal(1), z.literal(2)]),
	amplifierModelId: z.number().int().positive(),
	cabinetsPerChannel: z.number().int().min(1).max(16),
	heightM: z.number().min(0).max(30).nullable().optional(),
	flown: z.boolean().optional(),
	/** The group pattern (e.g. subwoofers in a cardioid arrangement), as a package group has it. */
	directivity: optionalDirectivitySchema
});

export const systemSchema = z.object({
	groups: z.array(systemGroupSchema).min(1, 'A system needs at least one group').max(6)
});
export type SystemInput = z.infer<typeof systemSchema>;

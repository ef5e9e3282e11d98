import { z } from 'zod';
import { patchSchemaOf } from './inventory-common';

export const UNIT_MODEL_TYPES = ['loudspeaker', 'amplifier'] as const;
export const STOCK_UNIT_STATUSES = ['ready', 'in-repair', 'retired'] as const;
export type StockUnitStatus = (typeof STOCK_UNIT_STATUSES)[number];

export const stockUnitFields = z.object({
	serial: z
		.string()
		.trim()
		.min(2, 'At least 2 characters')
		.max(60, 'At most 60 characters')
		.regex(/^[A-Za-z0-9][A-Za-z0-9._\/-]*$/, 'Letters, digits, dot, slash and hyphen only'),
	modelType: z.enum(UNIT_MODEL_TYPES, { error: 'Choose loudspeaker or amplifier' }),
	modelId: z.number({ error: 'Choose a model' }).int().positive('Choose a model'),
	status: z.enum(STOCK_UNIT_STATUSES, { error: 'Choose a status' }).default('ready'),
	location: z.string().trim().max(120, 'At most 120 characters').default(''),
	/** ISO date (yyyy-mm-dd) of the last electrical/acoustic test, or null when never tested. */
	lastTestedAt: z.iso.date('Use a date like 2026-03-14').nullable().default(null),
	notes: z.string().trim().max(2000, 'At most 2000 characters').default('')
});

export const stockUnitSchema = stockUnitFields;
export type StockUnitInput = z.output<typeof stockUnitSchema>;

export const stockUnitPatchSchema = patchSchemaOf(stockUnitFields);
export type StockUnitPatch = z.output<typeof stockUnitPatchSchema>;

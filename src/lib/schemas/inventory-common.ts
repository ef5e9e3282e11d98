import { z } from 'zod';

/**
 * Building blocks for the inventory schemas. Ranges are what a real cabinet or amplifier can have,
 * so a typo (a sensitivity of 9.8 dB, a weight of 3500 kg) is caught at the door.
 */
export function measure(min: number, max: number, unit: string) {
	return z
		.number({ error: 'Enter a number' })
		.refine(Number.isFinite, 'Enter a number')
		.min(min, `At least ${min} ${unit}`)
		.max(max, `At most ${max} ${unit}`);
}

/** A measurement the maker may not publish: absent or null means "not given". */
export function optionalMeasure(min: number, max: number, unit: string) {
	return measure(min, max, unit).nullable().default(null);
}

export const nameField = z.string().trim().min(1, 'Enter a name').max(120, 'At most 120 characters');
export const makerField = z.string().trim().min(1, 'Enter the maker').max(120, 'At most 120 characters');
export const notesField = z.string().trim().max(2000, 'At most 2000 characters').default('');

/** Money in integer minor units (pence, cents). */
export const minorUnits = z
	.number({ error: 'Enter an amount' })
	.int('Whole minor units only (e.g. 4500 for 45.00)')
	.min(0, 'Cannot be negative')
	.max(100_000_000, 'That amount is implausibly large');

export const weightKg = measure(0.1, 500, 'kg');

/**
 * A PATCH body: any subset of the fields, unknown keys refused. Unlike `.partial()`, a field left out
 * stays out — zod would otherwise fill in its default (null, '') and a PATCH would wipe it.
 */
export function patchSchemaOf<S extends z.ZodObject>(fields: S): z.ZodType<Partial<z.output<S>>> {
	const shape = Object.fromEntries(
		Object.entries(fields.shape).map(([key, field]) => [key, ((field instanceof z.ZodDefault ? field.unwrap() : field) as z.ZodType).optional()])
	);
	return z.object(shape).strict() as unknown as z.ZodType<Partial<z.output<S>>>;
}

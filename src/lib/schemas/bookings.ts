/** Schemas for the warehouse's out-and-back work: scans, damage reports, repairs, test intervals, availability queries. */
import { z } from 'zod';
import { BOOKING_STATES } from '../bookings/states';

/** A serial as printed on a unit label (same shape as stock units' serials). */
export const serialField = z
	.string({ error: 'Scan or type a serial' })
	.trim()
	.min(1, 'Scan or type a serial')
	.max(60, 'At most 60 characters')
	.regex(/^[A-Za-z0-9][A-Za-z0-9._\/-]*$/, 'A serial has letters, digits, dot, slash and hyphen only');

export const scanSchema = z.object({ serial: serialField });

export const modelKeyField = z.string().regex(/^(loudspeaker|amplifier):[1-9]\d{0,9}$/, 'A model like loudspeaker:12 or amplifier:3');

export const repairSchema = z.object({
	description: z.string({ error: 'Say what was done' }).trim().min(2, 'Say what was done').max(500, 'At most 500 characters'),
	costMinor: z
		.number({ error: 'The cost in minor units (pence, cents), 0 if none' })
		.int('Whole minor units (pence, cents)')
		.min(0, '0 or more')
		.max(100_000_000, 'At most 1,000,000.00'),
	done: z.boolean({ error: 'Say whether the repair is done' })
});
export type RepairInput = z.output<typeof repairSchema>;

/** The repair form: the cost typed in major units (e.g. 12.50), done as a checkbox. */
export const repairFormSchema = z.object({
	description: repairSchema.shape.description,
	cost: z.coerce.number({ error: 'Enter the cost, 0 if none' }).min(0, '0 or more').max(1_000_000, 'At most 1,000,000'),
	done: z.preprocess((v) => v === 'on' || v === 'true' || v === true, z.boolean())
});

export const damageSchema = z.object({
	unitId: z.coerce.number({ error: 'Choose the unit' }).int().positive('Choose the unit'),
	notes: z.string({ error: 'Describe the damage' }).trim().min(2, 'Describe the damage').max(2000, 'At most 2000 characters')
});

export const siteAddressSchema = z.object({
	siteAddress: z.string().trim().max(300, 'At most 300 characters')
});

export const testIntervalSchema = z.object({
	model: modelKeyField,
	days: z.preprocess(
		(v) => (v === '' || v === null || v === undefined ? null : Number(v)),
		z.number({ error: 'Whole days, or empty for the company default' }).int('Whole days').min(1, 'At least 1 day').max(1825, 'At most 1825 days').nullable()
	)
});

const isoDate = z.iso.date('Use a date like 2026-03-14');

export const availabilityQuerySchema = z
	.object({ from: isoDate, to: isoDate, model: modelKeyField.optional() })
	.refine((q) => q.to >= q.from, { message: 'The end is before the start', path: ['to'] })
	.refine((q) => Date.parse(q.to) - Date.parse(q.from) <= 371 * 86_400_000, { message: 'At most 53 weeks at a time', path: ['to'] });

export const bookingListQuerySchema = z.object({ state: z.enum(BOOKING_STATES, { error: `One of ${BOOKING_STATES.join(', ')}` }).optional() });


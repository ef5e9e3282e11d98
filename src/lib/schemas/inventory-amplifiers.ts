import { z } from 'zod';
import { makerField, measure, minorUnits, nameField, notesField, optionalMeasure, patchSchemaOf, weightKg } from './inventory-common';

const ratedPower = optionalMeasure(1, 20000, 'W');

/** Every field of an amplifier model, without the cross-field rules (so it can be made partial). */
export const amplifierFields = z.object({
	name: nameField,
	maker: makerField,
	channels: z.number({ error: 'Enter a number' }).int('Whole channels only').min(1, 'At least 1').max(16, 'At most 16'),
	powerW8: ratedPower,
	powerW4: ratedPower,
	powerW2: ratedPower,
	minLoadOhm: measure(1, 16, 'Ω'),
	rackUnits: z.number({ error: 'Enter a number' }).int('Whole rack units only').min(1, 'At least 1 U').max(12, 'At most 12 U'),
	weightKg,
	dayRateMinor: minorUnits,
	replacementValueMinor: minorUnits,
	/** Mains current at 1/8 power, for generator sizing. */
	mainsCurrentAmps: measure(0.1, 100, 'A'),
	notes: notesField
});

type AmplifierDraft = z.output<typeof amplifierFields>;

function checkAmplifier(v: AmplifierDraft, ctx: z.RefinementCtx) {
	if (v.powerW8 == null && v.powerW4 == null && v.powerW2 == null) {
		ctx.addIssue({ code: 'custom', path: ['powerW8'], message: 'Give the power per channel at one load at least' });
	}
	const ratedLoads = ([8, 4, 2] as const).filter((ohm) => v[`powerW${ohm}`] != null);
	if (ratedLoads.length > 0 && Math.min(...ratedLoads) < v.minLoadOhm) {
		ctx.addIssue({ code: 'custom', path: ['minLoadOhm'], message: 'A power is rated below this minimum load' });
	}
}

/** A complete amplifier model: forms, API create, CSV rows and merged updates. */
export const amplifierSchema = amplifierFields.superRefine(checkAmplifier);
export type AmplifierInput = z.output<typeof amplifierSchema>;

export const amplifierPatchSchema = patchSchemaOf(amplifierFields);

/** The fields the acoustic model reads (AmplifierSpec). */
export const AMPLIFIER_ACOUSTIC_FIELDS = ['channels', 'powerW8', 'powerW4', 'powerW2', 'minLoadOhm'] as const satisfies readonly (keyof AmplifierInput)[];

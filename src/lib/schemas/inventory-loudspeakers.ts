import { z } from 'zod';
import { bandResponseSchema, compressionSchema, optionalDirectivitySchema } from './directivity';
import { makerField, measure, minorUnits, nameField, notesField, optionalMeasure, patchSchemaOf, weightKg } from './inventory-common';

export const LOUDSPEAKER_KINDS = ['full-range', 'subwoofer', 'line-array-element', 'monitor'] as const;
export const SENSITIVITY_REFS = ['1W', '2.83V'] as const;

/** Every field of a loudspeaker model, without the cross-field rules (so it can be made partial). */
export const loudspeakerFields = z.object({
	name: nameField,
	maker: makerField,
	kind: z.enum(LOUDSPEAKER_KINDS, { error: 'Choose the kind of cabinet' }),
	sensitivityDb: measure(70, 120, 'dB'),
	sensitivityRef: z.enum(SENSITIVITY_REFS, { error: 'Choose 1 W or 2.83 V' }),
	impedanceOhm: measure(1, 32, 'Ω'),
	powerContinuousW: measure(1, 20000, 'W'),
	powerPeakW: optionalMeasure(1, 80000, 'W'),
	maxSplContinuousDb: optionalMeasure(80, 160, 'dB'),
	maxSplPeakDb: optionalMeasure(80, 160, 'dB'),
	dispersionHDeg: measure(5, 360, '°'),
	dispersionVDeg: measure(5, 360, '°'),
	lowHz: measure(10, 1000, 'Hz'),
	// 1 kHz–40 kHz for cabinets that carry the mid and high bands; a subwoofer's upper limit sits far
	// lower (40 Hz–1 kHz), else the model would credit it with mid-band output (see checkLoudspeaker).
	highHz: measure(40, 40000, 'Hz'),
	heightM: optionalMeasure(0.05, 2, 'm'),
	bandResponseDb: bandResponseSchema,
	compressionDb: compressionSchema,
	directivity: optionalDirectivitySchema,
	weightKg,
	dayRateMinor: minorUnits,
	replacementValueMinor: minorUnits,
	notes: notesField
});

type LoudspeakerDraft = z.output<typeof loudspeakerFields>;

/** Rules between fields: the acoustic model refuses line-array elements without a height. */
function checkLoudspeaker(v: LoudspeakerDraft, ctx: z.RefinementCtx) {
	if (v.kind === 'subwoofer' && v.highHz > 1000) {
		ctx.addIssue({ code: 'custom', path: ['highHz'], message: 'A subwoofer’s upper limit is at most 1000 Hz' });
	} else if (v.kind !== 'subwoofer' && v.highHz < 1000) {
		ctx.addIssue({ code: 'custom', path: ['highHz'], message: 'At least 1000 Hz for a cabinet that is not a subwoofer' });
	}
	if (v.lowHz >= v.highHz) {
		ctx.addIssue({ code: 'custom', path: ['highHz'], message: 'Must be above the low frequency limit' });
	}
	if (v.kind === 'line-array-element' && v.heightM == null) {
		ctx.addIssue({ code: 'custom', path: ['heightM'], message: 'A line-array element needs its height' });
	}
	if (v.powerPeakW != null && v.powerPeakW < v.powerContinuousW) {
		ctx.addIssue({ code: 'custom', path: ['powerPeakW'], message: 'Peak power cannot be below continuous' });
	}
	if (v.maxSplPeakDb != null && v.maxSplContinuousDb != null && v.maxSplPeakDb < v.maxSplContinuousDb) {
		ctx.addIssue({ code: 'custom', path: ['maxSplPeakDb'], message: 'Peak max SPL cannot be below continuous' });
	}
}

/** A complete loudspeaker model: forms, API create, CSV rows and merged updates. */
export const loudspeakerSchema = loudspeakerFields.superRefine(checkLoudspeaker);
export type LoudspeakerInput = z.output<typeof loudspeakerSchema>;

/** An API PATCH body: any subset of fields; the service re-checks the merged result. */
export const loudspeakerPatchSchema = patchSchemaOf(loudspeakerFields);

/** The fields the acoustic model reads: changing one re-checks open quotes. */
export const LOUDSPEAKER_ACOUSTIC_FIELDS = [
	'kind',
	'sensitivityDb',
	'sensitivityRef',
	'impedanceOhm',
	'powerContinuousW',
	'powerPeakW',
	'maxSplContinuousDb',
	'maxSplPeakDb',
	'dispersionHDeg',
	'dispersionVDeg',
	'lowHz',
	'highHz',
	'heightM',
	'bandResponseDb',
	'compressionDb',
	'directivity'
] as const satisfies readonly (keyof LoudspeakerInput)[];

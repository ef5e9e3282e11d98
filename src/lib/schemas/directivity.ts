import { z } from 'zod';
import { NOMINAL_BANDS, type NominalBandKey } from './programmes';

/**
 * Gear data the v2 acoustic model reads (shared/acoustics.md, inputs): a cabinet's per-band response,
 * its power compression, and a horizontal directivity table (bands × angles) that a loudspeaker model
 * or a package group (its own pattern) may carry. One schema for forms, API, CSV import and seeders.
 */

export type BandResponse = Partial<Record<NominalBandKey, number>>;
export interface DirectivityTable {
	anglesDeg: number[];
	bandsDb: Partial<Record<NominalBandKey, number[]>>;
}

/** At most every 5° from 0 to 180: finer tables add nothing the model's linear interpolation needs. */
export const MAX_DIRECTIVITY_ANGLES = 37;
/** Deepest attenuation a table may hold; a cardioid's rear null rarely measures beyond 30 dB. */
export const MAX_ATTENUATION_DB = 60;

const finite = z.number({ error: 'Enter a number' }).refine(Number.isFinite, 'Enter a number');

/** Output in a band relative to the sensitivity (0 = flat); only the nine octave bands. */
export const bandResponseSchema = z
	.partialRecord(z.enum(NOMINAL_BANDS, { error: 'Only the octave bands 31.5 … 8000 Hz' }), finite.min(-40, 'At least −40 dB').max(20, 'At most +20 dB'))
	// No transform (forms derive a JSON Schema from this, which cannot hold one): the form and the CSV
	// reader send null for an empty response, and the spec mapping treats {} as "not given" too.
	.nullish();

/**
 * Power compression at full continuous power. The v2 fields are optional keys (absent or null: not
 * given) so records written before them, and fixtures that never mention them, stay valid.
 */
export const compressionSchema = finite.min(0, '0 dB or more').max(20, 'At most 20 dB').nullish();

const tableFields = z.object({
	anglesDeg: z
		.array(finite.min(0, 'Angles run from 0° to 180°').max(180, 'Angles run from 0° to 180°'), { error: 'Give the angles' })
		.min(2, 'At least the angles 0° and 180°')
		.max(MAX_DIRECTIVITY_ANGLES, `At most ${MAX_DIRECTIVITY_ANGLES} angles`),
	bandsDb: z.partialRecord(
		z.enum(NOMINAL_BANDS, { error: 'Only the octave bands 31.5 … 8000 Hz' }),
		z.array(finite, { error: 'Give one value per angle' })
	)
});

/** Label of a band key as people say it ("125 Hz", "1 kHz"). */
export function bandLabel(band: string): string {
	const hz = Number(band);
	return hz >= 1000 ? `${hz / 1000} kHz` : `${band} Hz`;
}

/** The contract's rules: angles start at 0, end at 180 and ascend; each band row has one value ≥ 0 per angle. */
function checkTable(v: z.output<typeof tableFields>, ctx: z.RefinementCtx) {
	const angles = v.anglesDeg;
	if (angles[0] !== 0) ctx.addIssue({ code: 'custom', path: ['anglesDeg'], message: 'The first angle must be 0° (on axis)' });
	if (angles[angles.length - 1] !== 180) ctx.addIssue({ code: 'custom', path: ['anglesDeg'], message: 'The last angle must be 180° (behind)' });
	const bad = angles.findIndex((a, i) => i > 0 && a <= angles[i - 1]);
	if (bad > 0) ctx.addIssue({ code: 'custom', path: ['anglesDeg'], message: `Angles must ascend: ${angles[bad]}° follows ${angles[bad - 1]}°` });
	const bands = Object.entries(v.bandsDb) as [NominalBandKey, number[]][];
	if (bands.length === 0) ctx.addIssue({ code: 'custom', path: ['bandsDb'], message: 'Give at least one band row' });
	for (const [band, row] of bands) {
		if (row.length !== angles.length) {
			ctx.addIssue({
				code: 'custom',
				path: ['bandsDb', band],
				message: `${bandLabel(band)}: ${row.length} value${row.length === 1 ? '' : 's'} for ${angles.length} angles — give one per angle`
			});
			continue;
		}
		row.forEach((value, i) => {
			if (value < 0) ctx.addIssue({ code: 'custom', path: ['bandsDb', band, i], message: `${bandLabel(band)} at ${angles[i]}°: attenuation is 0 dB or more` });
			else if (value > MAX_ATTENUATION_DB) ctx.addIssue({ code: 'custom', path: ['bandsDb', band, i], message: `${bandLabel(band)} at ${angles[i]}°: at most ${MAX_ATTENUATION_DB} dB` });
		});
	}
}

/** A horizontal directivity table: attenuation re on axis, dB ≥ 0, symmetric left/right. */
export const directivitySchema = tableFields.superRefine(checkTable);

/** An optional table on a model or group: absent or null means "none entered". */
export const optionalDirectivitySchema = directivitySchema.nullish();

/** The angles a new table starts with (every 30°, as most makers print polar plots). */
export const DEFAULT_ANGLES_DEG = [0, 30, 60, 90, 120, 150, 180];

/**
 * Throwline's acoustic model (contract: shared/acoustics.md). Pure functions, no I/O.
 *
 * METHOD. For each group of cabinets: channel power into the real parallel load, capability at
 * 1 m (sensitivity + power, capped by the cabinet's power rating and max SPL; continuous and peak),
 * then per octave band the group's level at distance x: point-source inverse square law
 * (−20·lg x), or for line arrays the line-source law (−10·lg x inside the transition distance
 * d_t = H²·f/(2c), −20·lg x beyond), plus stacking gain and ISO 9613-1 air absorption α·x.
 * Groups add by energy. The programme spectrum is scaled so its weighted sum meets the target;
 * headroom = capability − requirement (peak side adds the crest factor). Boundary levels come from
 * driving the package for exactly the requirement and applying the same laws at the boundary.
 *
 * SOURCES. ISO 9613-1:1993 (air absorption, eqs. (3)–(5), Annex B humidity conversion);
 * ISO 9613-2:1996 (geometric divergence eq. (7), Table 2 band attenuation); IEC 61672-1:2013
 * (A and C weightings, Annex E analytic form); IEC 61260-1:2014 (base-10 octave mid-band frequencies).
 *
 * SIMPLIFICATIONS. Free field over flat ground; no wind, temperature gradient or ground reflection;
 * every cabinet aimed at the position (on-axis sensitivity); full-range cabinets add incoherently,
 * subwoofers and line-array elements coherently within a stack and incoherently between stacks;
 * the line-source transition uses the conventional H²·f/(2c), while published alternatives (the
 * Fresnel range of ANSI/ASA S1.1; Urban, Heil & Bauman 2001) differ by up to 2× and Ureda (2002)
 * warns the simple form understates the transition off the centreline. MODEL_ASSUMPTIONS carries the
 * same caveats in plain language for the UI.
 *
 * CHOICES WHERE THE CONTRACT IS SILENT (each is tested):
 * - Bands are labelled by nominal centre (bands[].hz = 31.5 … 8000, and a cabinet covers a band when
 *   lowHz ≤ nominal ≤ highHz) but computed at the exact base-10 frequency 1000·10^(3k/10): the
 *   IEC 61672-1 and ISO 9613 tables were computed that way (A at nominal 125 Hz is −16.19, printed −16.1).
 * - bands[] lists the programme's bands only, ascending. A band no group covers has capability and
 *   headroom −Infinity (JSON turns these into null; the API layer should say "not covered").
 * - Step 1 when 8 Ω is not rated and Z_L is above every rated load: scale from the largest rated
 *   load (the amplifier is voltage-limited above it), as the contract does with 8 Ω.
 * - limitedBy ties: the cabinet's own limit is named before the amplifier (max-spl, then thermal,
 *   then amplifier), since a bigger amplifier would not help; equal contributors → first group.
 * - When limitedBy is 'coverage', limitingBandHz still names the band with the least headroom.
 * - Boundary and chart: bands no group covers make no sound and are left out of the sum; with no
 *   covered band the prediction is −Infinity and the margin +Infinity.
 * - No audienceWidthM: coverage.ok is true and audienceWidthM null (nothing was asked).
 * - Coverage compares width ≥ audience width with a 1e-9 relative tolerance (tan 45° is 0.999…).
 * - The line-array transition uses the exact band frequency and c from the air temperature.
 * - The chart helper (levelCurve / levelAtDistance) drives the package as step 8 does and reports
 *   the continuous level in A, C and Z at any distance; it passes through the target at the
 *   position and through boundary.predictedDb at the boundary (see curve.ts).
 * - An empty package evaluates as 'short', limitedBy 'no-coverage', needing no amplifiers.
 * - Amplifier models are identified by value (channels, ratings, minimum load); groups on the same
 *   model pool channels; a channel drives cabinets of one stack (see amplifiers.ts).
 * - Peak capability uses the amplifier's rated (continuous) channel power, as the contract says;
 *   amplifier burst headroom is ignored, which errs on the safe side.
 * - Thrown AcousticsInputError (plain Error subclass) for: load below amplifier minimum, line-array
 *   element without heightM, non-positive/non-finite distances, unknown weighting or kind, programme
 *   with no bands or a non-octave band, negative crest factor or margin, humidity outside 0–100 %,
 *   cabinets per channel more than the cabinets in a stack, missing amplifier rating.
 */
export * from './types';
export {
	NOMINAL_BAND_CENTRES_HZ,
	EXACT_BAND_FREQUENCIES_HZ,
	BAND_COUNT,
	exactOctaveFrequencyHz,
	bandIndexOf,
	type NominalBandHz
} from './bands';
export { aWeighting, cWeighting, weighting, isWeighting } from './weighting';
export { airAbsorption, REFERENCE_PRESSURE_KPA } from './absorption';
export {
	sumLevels,
	sumLevelsCoherent,
	pointSourceDivergenceDb,
	lineSourceTransitionM,
	lineSourceDivergenceDb
} from './levels';
export { channelPowerW, sensitivity1WDb, RATED_LOADS_OHM } from './power';
export { groupChannels, amplifierNeeds } from './amplifiers';
export { DEFAULT_MARGIN_DB } from './requirement';
export { evaluatePackage } from './evaluate';
export { levelAtDistance, levelCurve, type LevelPoint, type WeightedLevels } from './curve';
export { feetToMetres, metresToFeet, speedOfSound, METRES_PER_FOOT } from './units';
export { MODEL_ASSUMPTIONS } from './assumptions';
export { AcousticsInputError } from './errors';

/**
 * Throwline's acoustic model (contract: shared/acoustics.md, version 2). Pure functions, no I/O.
 *
 * METHOD. For each group of cabinets: channel power into the real parallel load, capability at
 * 1 m (sensitivity + power, capped by the cabinet's power rating and max SPL; continuous side less
 * the power compression, peak side from the amplifier's 2·P sine peak), raised per band by the
 * cabinet's response; then per octave band the group's level at distance x: point-source inverse
 * square law (−20·lg x), or for line arrays the line-source law (−10·lg x inside the transition
 * distance d_t = H²·f/(2c), −20·lg x beyond), plus stacking gain and ISO 9613-1 air absorption α·x.
 * With a site, x is the slant distance from each group's acoustic centre to the point, and each
 * group loses its horizontal directivity at the off-axis angle and the ISO 9613-2 ground
 * attenuation. Groups add by energy. The programme spectrum is scaled so its weighted sum meets the
 * target; headroom = capability − requirement (peak side adds the crest factor). Levels elsewhere
 * (boundary, receivers, grid) come from driving the package for exactly the requirement at the
 * position and applying the same laws at the other point.
 *
 * SOURCES. ISO 9613-1:1993 (air absorption, eqs. (3)–(5), Annex B humidity conversion);
 * ISO 9613-2:1996 (geometric divergence eq. (7), Table 2 band attenuation, §7.3.1 ground
 * attenuation Table 3 and eq. (9)); IEC 61672-1:2013 (A and C weightings, Annex E analytic form);
 * IEC 61260-1:2014 (base-10 octave mid-band frequencies). Checked against DTU PyWake's ISO 9613-2
 * ground_eff figures, IEC/ISO tables and worked examples (see the *.spec.ts files).
 *
 * SIMPLIFICATIONS. Without a site: free field, on the system's axis. With a site: flat ground with
 * one G for the source, middle and receiver regions, ISO 9613-2 predicts downwind propagation
 * (C_met = 0, the cautious case for a limit); every group stands at the origin; horizontal
 * directivity only (no vertical aiming, no curved-array or cardioid-array physics beyond a
 * pattern table); no barriers, buildings, stage reflections or delay towers. Full-range cabinets
 * add incoherently, subwoofers and line-array elements coherently within a stack and incoherently
 * between stacks. The line-source transition uses the conventional H²·f/(2c), while published
 * alternatives (the Fresnel range of ANSI/ASA S1.1; Urban, Heil & Bauman 2001) differ by up to 2×
 * and Ureda (2002) warns the simple form understates the transition off the centreline. The
 * default directivity is deliberately cautious (enter the maker's polar data). MODEL_ASSUMPTIONS
 * carries the same caveats in plain language for the UI.
 *
 * CHOICES WHERE THE CONTRACT IS SILENT (each is tested):
 * - Bands are labelled by nominal centre (bands[].hz = 31.5 … 8000, and a cabinet covers a band when
 *   lowHz ≤ nominal ≤ highHz) but computed at the exact base-10 frequency 1000·10^(3k/10): the
 *   IEC 61672-1 and ISO 9613 tables were computed that way (A at nominal 125 Hz is −16.19, printed −16.1).
 * - bands[] lists the programme's bands only, ascending. A band no group covers has capability and
 *   headroom −Infinity (JSON turns these into null; the API layer should say "not covered").
 * - Step 1 when 8 Ω is not rated and Z_L is above every rated load: scale from the largest rated
 *   load (the amplifier is voltage-limited above it), as the contract does with 8 Ω.
 * - Step 2: bandResponseDb is added after the max-SPL caps, as the text orders it. compressionDb must
 *   be ≥ 0; a band response key that is not one of the nine bands is refused.
 * - limitedBy: among the groups covering the limiting band, the one contributing most at the
 *   position (with the site's effects) names the reason; equal contributors → first group.
 * - When limitedBy is 'coverage', limitingBandHz still names the band with the least headroom.
 * - Driven levels (boundary, receivers, grid, chart): bands no group covers make no sound and are
 *   left out of the sum; with no covered band the prediction is −Infinity and the margin +Infinity
 *   (a grid point is NaN then).
 * - No audienceWidthM: coverage.ok is true and audienceWidthM null (nothing was asked).
 * - Coverage compares width ≥ audience width with a 1e-9 relative tolerance (tan 45° is 0.999…);
 *   with a site it uses the horizontal distance to the position, since horizontal dispersion
 *   spreads in plan whatever the heights.
 * - The line-array transition uses the exact band frequency and c from the air temperature; with a
 *   site it is compared with the slant distance.
 * - "Any distance below 1 m is taken as 1 m" applies to the slant distance, and air absorption is
 *   taken over the same (clamped) distance.
 * - Directivity: a table with no band rows carries no data and the default pattern applies; table
 *   values may be negative (louder than on axis, as measured polars can be) but must be finite;
 *   angles must strictly ascend; an angle outside 0 … 180° passed to directivityDb folds by symmetry.
 * - The position is exactly on axis (φ = 0); so is the boundary point with a site.
 * - Heights (groups, position, receivers, grid) must be ≥ 0; the allowance must be ≥ 0 (it is added
 *   for weather and inversions, never a credit); receivers need a non-empty name.
 * - A band-limited receiver reports the weighting it was given, though its level is unweighted:
 *   read bandHz first.
 * - limits: on a tie of maxTargetDb the first receiver in the site's order binds, the boundary
 *   after the receivers. A receiver whose prediction is null has no margin and is left out.
 * - levelGrid: the count of points per axis is ⌊(max − min)/step⌋ + 1 with a 1e-9 relative
 *   tolerance, so 0 … 0.3 by 0.1 gives 4 points despite rounding; max below min is refused.
 * - The chart helper (levelCurve / levelAtDistance) is the v2 model without a site: it drives the
 *   package as step 8 does and reports the continuous level in A, C and Z at any distance on axis;
 *   it passes through the target at the position and, without a site, through
 *   boundary.predictedDb at the boundary (see curve.ts). A request's site is not applied there.
 * - An empty package evaluates as 'short', limitedBy 'no-coverage', needing no amplifiers.
 * - Amplifier models are identified by value (channels, ratings, minimum load); groups on the same
 *   model pool channels; a channel drives cabinets of one stack (see amplifiers.ts).
 * - A package is prepared once and cached by object identity (and by the identity of its groups
 *   list and each group): a group edited in place must be replaced by a new object to be seen.
 *   A programme is checked once per object and kept while its nine band values and crest factor
 *   are unchanged (a key that is not a band, added after the first evaluation, is not noticed).
 * - A site is checked once per object and kept while its aimDeg, groundFactor, positionHeightM,
 *   allowanceDb, receivers list and each receiver object are unchanged: a receiver edited in place
 *   must be replaced by a new object to be seen. For each (prepared package, checked site, air) the
 *   field on the site is kept inside the prepared package (placement.ts): each receiver's distance,
 *   off-axis angle and energy sums (slant distances, directivity, ground, air absorption,
 *   spreading), and the position's and boundary point's at the last distance asked. An evaluation
 *   then only applies the drive; the numbers are the same computation, so results do not change.
 * - With a site, receiver and grid levels carry all their air absorption inside the energy sums
 *   (faster); beyond roughly 3000 dB of absorption (some 15–40 km at 8 kHz) such a band underflows
 *   to silence, so a receiver that far predicts −Infinity (margin +Infinity) in those bands. The
 *   position's capability keeps the full range.
 * - Thrown AcousticsInputError (plain Error subclass) for: load below amplifier minimum, line-array
 *   element without heightM, non-positive/non-finite distances, unknown weighting or kind, programme
 *   with no bands or a non-octave band, negative crest factor or margin, humidity outside 0–100 %,
 *   cabinets per channel more than the cabinets in a stack, missing amplifier rating; v2: directivity
 *   angles not 0 … 180 ascending or a row of the wrong length, groundFactor outside 0 … 1, a grid
 *   step ≤ 0 or more than 250 000 points, and the site checks above.
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
export { levelGrid, MAX_GRID_POINTS } from './grid';
export { groundAttenuation } from './ground';
export { directivityDb, DEFAULT_REAR_LIMIT_DB } from './directivity';
export { bearingDeg, offAxisDeg, pointOnBearing } from './geometry';
export { compareOutcomes } from './receivers';
export { DEFAULT_LISTENING_HEIGHT_M } from './site';
export { DEFAULT_GROUP_HEIGHT_M } from './groups';
export { levelAtDistance, levelCurve, type LevelPoint, type WeightedLevels } from './curve';
export { feetToMetres, fromMetres, metresToFeet, speedOfSound, toMetres, METRES_PER_FOOT, type DistanceUnit } from './units';
export { MODEL_ASSUMPTIONS } from './assumptions';
export { AcousticsInputError } from './errors';

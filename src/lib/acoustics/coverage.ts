/**
 * Coverage of the audience width (contract step 6). Only full-range cabinets and line-array
 * elements spread the programme across the audience; subwoofers and monitors do not count.
 * Each stack covers 2·d·tan(dispersionH/2) at distance d (its −6 dB angle), unbounded from 180° up,
 * and the widths of all stacks add (the contract's simplification: no overlap is subtracted).
 * ok = width ≥ audienceWidthM, allowing for floating-point rounding.
 */
import type { CoverageResult, LoudspeakerKind } from './types';

export interface CoveringGroup {
	kind: LoudspeakerKind;
	stacks: number;
	spec: { loudspeaker: { dispersionHDeg: number } };
}

export function stackCoverageWidthM(dispersionHDeg: number, distanceM: number): number {
	if (dispersionHDeg >= 180) return Infinity;
	return 2 * distanceM * Math.tan((dispersionHDeg * Math.PI) / 360);
}

export function coverageAt(
	groups: readonly CoveringGroup[],
	distanceM: number,
	audienceWidthM: number | undefined
): CoverageResult {
	let widthM = 0;
	for (const g of groups) {
		if (g.kind !== 'full-range' && g.kind !== 'line-array-element') continue;
		widthM += g.stacks * stackCoverageWidthM(g.spec.loudspeaker.dispersionHDeg, distanceM);
	}
	// No audience width asked for: nothing to fail, so coverage is reported but counts as ok.
	if (audienceWidthM === undefined) return { widthM, audienceWidthM: null, ok: true };
	// A relative tolerance of 1e-9 so 2·d·tan(45°) = 0.999…·2d still covers exactly 2d.
	return { widthM, audienceWidthM, ok: widthM >= audienceWidthM * (1 - 1e-9) };
}

/**
 * Coverage of the audience width (contract step 6, v2). Only full-range cabinets and line-array
 * elements spread the programme across the audience; subwoofers and monitors do not count.
 * Stacks aimed at one audience do not add: the width is the widest group's 2·d·tan(dispersionH/2)
 * (unbounded from 180° up), plus spacingM when the group has more than one stack.
 * ok = width ≥ audienceWidthM, allowing for floating-point rounding.
 */
import type { CoverageResult } from './types';

export interface CoveringGroup {
	/** 2·tan(dispersionH/2) (∞ from 180°) for full-range and line arrays, 0 for the others. */
	coverageWidthAt1m: number;
	/** spacingM when there is more than one stack, else 0. */
	coverageSpacingM: number;
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
		if (g.coverageWidthAt1m === 0) continue;
		const width = g.coverageWidthAt1m * distanceM + g.coverageSpacingM;
		if (width > widthM) widthM = width;
	}
	// No audience width asked for: nothing to fail, so coverage is reported but counts as ok.
	if (audienceWidthM === undefined) return { widthM, audienceWidthM: null, ok: true };
	// A relative tolerance of 1e-9 so 2·d·tan(45°) = 0.999…·2d still covers exactly 2d.
	return { widthM, audienceWidthM, ok: widthM >= audienceWidthM * (1 - 1e-9) };
}

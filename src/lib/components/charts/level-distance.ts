/**
 * Layout and words for the level-versus-distance chart that are plain arithmetic: where the boundary's
 * marks and labels go, and the chart's text alternative. Pure, so it is tested without a DOM.
 */
import type { Weighting } from '../../acoustics/types';
import type { DistanceUnit } from '../../acoustics/units';
import { formatDistance, formatLevel, isDrawable } from './scales';

export interface CurvePoint {
	distanceM: number;
	/** −Infinity (or null after JSON) where the package covers no programme band. */
	levels: Record<Weighting, number | null>;
}

export interface BoundaryOnChart {
	distanceM: number;
	limitDb: number;
	weighting: Weighting;
	predictedDb: number | null;
}

/** Labels closer than this (px) would print on top of each other. */
const LABEL_CLEARANCE = 13;

/**
 * The boundary's marks at x position `bx`: the limit segment, the predicted dot, and their labels
 * nudged apart when the values are close, placed on the side of the plot with more room.
 */
export function boundaryMarks(
	boundary: BoundaryOnChart,
	bx: number,
	y: (db: number) => number,
	x0: number,
	x1: number
) {
	const predicted = isDrawable(boundary.predictedDb) ? boundary.predictedDb : null;
	const within = predicted !== null && predicted <= boundary.limitDb;
	let limitY = y(boundary.limitDb);
	let predictedY = predicted !== null ? y(predicted) : null;
	if (predictedY !== null && Math.abs(limitY - predictedY) < LABEL_CLEARANCE) {
		const mid = (limitY + predictedY) / 2;
		const predictedAbove = (predicted ?? 0) > boundary.limitDb;
		predictedY = predictedAbove ? mid - 7 : mid + 7;
		limitY = predictedAbove ? mid + 7 : mid - 7;
	}
	const labelLeft = bx > (x0 + x1) / 2;
	return {
		bx,
		within,
		dotY: predicted !== null ? y(predicted) : null,
		limitLineY: y(boundary.limitDb),
		segment: [Math.max(x0, bx - 26), Math.min(x1, bx + 26)] as const,
		labelX: labelLeft ? bx - 32 : bx + 32,
		labelAnchor: labelLeft ? ('end' as const) : ('start' as const),
		limitY,
		predictedY,
		titleAnchor:
			bx > x1 - 70 ? ('end' as const) : bx < x0 + 70 ? ('start' as const) : ('middle' as const)
	};
}

export interface SummaryInput {
	title?: string;
	weighting: Weighting;
	targetDb: number;
	positionM: number;
	unit: DistanceUnit;
	points: readonly CurvePoint[];
	hasCurve: boolean;
	boundary: BoundaryOnChart | null;
}

/** The chart's text alternative: what a sighted reader takes from the picture, in one paragraph. */
export function levelChartSummary(input: SummaryInput): string {
	const { title, weighting, targetDb, positionM, unit, points, hasCurve, boundary } = input;
	const parts: string[] = [];
	if (title) parts.push(`${title}. `);
	parts.push(
		`Level versus distance in dB(${weighting}), ${formatLevel(targetDb, weighting)} at front of house, ${formatDistance(positionM, unit)} from the system`
	);
	const far = [...points].reverse().find((p) => isDrawable(p.levels[weighting]));
	if (!hasCurve) parts.push('; the package covers no programme band, so there is no curve');
	else if (far && far.distanceM > positionM)
		parts.push(
			`, falling to ${formatLevel(far.levels[weighting], weighting)} at ${formatDistance(far.distanceM, unit)}`
		);
	parts.push('.');
	if (boundary) {
		const bw = boundary.weighting;
		const at = `Boundary at ${formatDistance(boundary.distanceM, unit)}: limit ${formatLevel(boundary.limitDb, bw)}`;
		if (isDrawable(boundary.predictedDb)) {
			const diff = boundary.predictedDb - boundary.limitDb;
			const verdict = diff <= 0 ? 'within the limit' : `over the limit by ${diff.toFixed(1)} dB`;
			parts.push(` ${at}, predicted ${formatLevel(boundary.predictedDb, bw)}, ${verdict}.`);
		} else parts.push(` ${at}, no predicted level.`);
	}
	return parts.join('');
}

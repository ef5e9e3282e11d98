/**
 * What the plan shows: a rectangle in metres around the system, the position, the audience line and
 * every receiver, with a margin, stretched to the drawing's shape so one metre is as long across as up
 * (a plan, not a chart). And the scale bar's length.
 */
import type { PlanPoint } from './geometry';

export interface PlanExtent {
	xMinM: number;
	xMaxM: number;
	yMinM: number;
	yMaxM: number;
}

export interface ExtentOptions {
	/** Drawing width ÷ height. */
	aspect: number;
	/** Space left around the points, as a share of their span (default 0.15). */
	marginShare?: number;
	/** The smallest span shown, metres (default 20): a site with one receiver at 3 m is not a 3 m plan. */
	minSpanM?: number;
}

export function planExtent(points: readonly PlanPoint[], options: ExtentOptions): PlanExtent {
	const { aspect, marginShare = 0.15, minSpanM = 20 } = options;
	const finite = points.filter((p) => Number.isFinite(p.x) && Number.isFinite(p.y));
	// The system is always on the plan.
	const all = [{ x: 0, y: 0 }, ...finite];
	let xMin = Math.min(...all.map((p) => p.x));
	let xMax = Math.max(...all.map((p) => p.x));
	let yMin = Math.min(...all.map((p) => p.y));
	let yMax = Math.max(...all.map((p) => p.y));
	const span = Math.max(xMax - xMin, yMax - yMin, minSpanM);
	const margin = span * marginShare;
	xMin -= margin;
	xMax += margin;
	yMin -= margin;
	yMax += margin;
	// Widen whichever side is short of the drawing's shape, keeping the points centred.
	const safeAspect = Number.isFinite(aspect) && aspect > 0 ? aspect : 1;
	let width = Math.max(xMax - xMin, minSpanM);
	let height = Math.max(yMax - yMin, minSpanM);
	if (width / height < safeAspect) width = height * safeAspect;
	else height = width / safeAspect;
	const cx = (xMin + xMax) / 2;
	const cy = (yMin + yMax) / 2;
	return { xMinM: cx - width / 2, xMaxM: cx + width / 2, yMinM: cy - height / 2, yMaxM: cy + height / 2 };
}

/** True when the point lies inside the extent (edges included). */
export function extentContains(extent: PlanExtent, point: PlanPoint): boolean {
	return (
		point.x >= extent.xMinM && point.x <= extent.xMaxM && point.y >= extent.yMinM && point.y <= extent.yMaxM
	);
}

/** Keeps a dragged point on the plan. */
export function clampToExtent(extent: PlanExtent, point: PlanPoint): PlanPoint {
	return {
		x: Math.min(extent.xMaxM, Math.max(extent.xMinM, point.x)),
		y: Math.min(extent.yMaxM, Math.max(extent.yMinM, point.y))
	};
}

/** The longest 1, 2 or 5 × 10ⁿ that fits in `maxLength` (in display units), for the scale bar. */
export function scaleBarLength(maxLength: number): number {
	if (!(maxLength > 0) || !Number.isFinite(maxLength)) return 0;
	const power = Math.pow(10, Math.floor(Math.log10(maxLength)));
	for (const mantissa of [5, 2, 1]) if (mantissa * power <= maxLength * (1 + 1e-9)) return mantissa * power;
	return power;
}

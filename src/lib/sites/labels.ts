/**
 * Where each contour line's label goes, in drawing pixels: one label per line long enough to carry
 * it, at the point that keeps furthest from the drawing's edges, from labels already placed and from
 * markers (system, position, receivers), turned along the line and never upside down.
 */
export type Pixel = [number, number];

export interface LabelRequest {
	value: number;
	/** The line's points in pixels. */
	points: readonly Pixel[];
}

export interface PlacedLabel {
	value: number;
	x: number;
	y: number;
	/** Rotation in degrees, −90 … 90, so the text reads left to right. */
	angleDeg: number;
}

export interface LabelOptions {
	width: number;
	height: number;
	/** Points to keep clear of (markers). */
	avoid?: readonly Pixel[];
	/** Lines shorter than this carry no label (default 60 px). */
	minLengthPx?: number;
	/** Nearest a label may come to another label or a marker (default 28 px). */
	minGapPx?: number;
	/** Nearest a label may come to the drawing's edge (default 14 px). */
	insetPx?: number;
	/** Candidates are tried about this far apart along a line (default 12 px). */
	stridePx?: number;
}

export function polylineLength(points: readonly Pixel[]): number {
	let length = 0;
	for (let i = 1; i < points.length; i++)
		length += Math.hypot(points[i][0] - points[i - 1][0], points[i][1] - points[i - 1][1]);
	return length;
}

/** Text angle along the segment a → b, folded into −90 … 90. */
export function uprightAngle(a: Pixel, b: Pixel): number {
	let deg = (Math.atan2(b[1] - a[1], b[0] - a[0]) * 180) / Math.PI;
	if (deg > 90) deg -= 180;
	if (deg < -90) deg += 180;
	return deg;
}

export function placeLabels(lines: readonly LabelRequest[], options: LabelOptions): PlacedLabel[] {
	const { width, height, avoid = [], minLengthPx = 60, minGapPx = 28, insetPx = 14, stridePx = 12 } = options;
	const taken: Pixel[] = [...avoid];
	const placed: PlacedLabel[] = [];
	for (const line of lines) {
		const pts = line.points;
		if (pts.length < 2 || polylineLength(pts) < minLengthPx) continue;
		let best: { score: number; i: number } | null = null;
		let travelled = 0;
		let nextAt = 0;
		for (let i = 1; i < pts.length - 1; i++) {
			travelled += Math.hypot(pts[i][0] - pts[i - 1][0], pts[i][1] - pts[i - 1][1]);
			if (travelled < nextAt) continue;
			nextAt = travelled + stridePx;
			const [x, y] = pts[i];
			const edge = Math.min(x, y, width - x, height - y);
			if (edge < insetPx) continue;
			let clearance = Infinity;
			for (const [tx, ty] of taken) clearance = Math.min(clearance, Math.hypot(x - tx, y - ty));
			if (clearance < minGapPx) continue;
			// Far from other labels matters most; far from the edge only until it is comfortably inside.
			const score = Math.min(clearance, 4 * minGapPx) + Math.min(edge, 3 * insetPx);
			if (!best || score > best.score) best = { score, i };
		}
		if (!best) continue;
		const p = pts[best.i];
		placed.push({
			value: line.value,
			x: p[0],
			y: p[1],
			angleDeg: uprightAngle(pts[best.i - 1], pts[best.i + 1])
		});
		taken.push(p);
	}
	return placed;
}

import { describe, expect, it } from 'vitest';
import { placeLabels, polylineLength, uprightAngle, type Pixel } from './labels';

function circle(cx: number, cy: number, r: number, n = 90): Pixel[] {
	return Array.from({ length: n + 1 }, (_, k) => {
		const t = (2 * Math.PI * k) / n;
		return [cx + r * Math.cos(t), cy + r * Math.sin(t)] as Pixel;
	});
}

describe('contour labels', () => {
	it('keeps text upright', () => {
		expect(uprightAngle([0, 0], [10, 0])).toBe(0);
		expect(uprightAngle([10, 0], [0, 0])).toBeCloseTo(0, 12);
		expect(uprightAngle([0, 0], [0, 10])).toBe(90);
		expect(uprightAngle([0, 10], [0, 0])).toBe(-90);
	});

	it('measures a polyline', () => {
		expect(polylineLength([[0, 0], [3, 4], [3, 10]])).toBe(11);
	});

	it('labels each long line once, inside the drawing, apart from each other and from markers', () => {
		const lines = [30, 60, 90, 120].map((r) => ({ value: r, points: circle(200, 200, r) }));
		const avoid: Pixel[] = [[200, 200]];
		const placed = placeLabels([{ value: 1, points: circle(200, 200, 5) }, ...lines], {
			width: 400,
			height: 300,
			avoid
		});
		expect(placed.map((p) => p.value)).toEqual([30, 60, 90, 120]); // the 5 px ring is too short
		for (const p of placed) {
			expect(p.x).toBeGreaterThanOrEqual(14);
			expect(p.y).toBeLessThanOrEqual(300 - 14);
			expect(p.angleDeg).toBeGreaterThanOrEqual(-90);
			expect(p.angleDeg).toBeLessThanOrEqual(90);
		}
		for (let a = 0; a < placed.length; a++)
			for (let b = a + 1; b < placed.length; b++)
				expect(Math.hypot(placed[a].x - placed[b].x, placed[a].y - placed[b].y)).toBeGreaterThanOrEqual(28);
	});

	it('places nothing on a line that lies wholly outside the drawing', () => {
		expect(placeLabels([{ value: 60, points: circle(-500, -500, 100) }], { width: 200, height: 200 })).toEqual([]);
	});
});

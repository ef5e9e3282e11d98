import { describe, expect, it } from 'vitest';
import { clampToExtent, extentContains, planExtent, scaleBarLength } from './extent';

describe('plan extent', () => {
	const points = [
		{ x: 0, y: 40 },
		{ x: -150, y: -60 },
		{ x: 220, y: 180 }
	];

	it('holds the system and every point with a margin', () => {
		const e = planExtent(points, { aspect: 1.5 });
		for (const p of [...points, { x: 0, y: 0 }]) {
			expect(extentContains(e, p)).toBe(true);
			expect(p.x - e.xMinM).toBeGreaterThan(0);
			expect(e.xMaxM - p.x).toBeGreaterThan(0);
		}
	});

	it("has the drawing's shape, so a metre is as long across as up", () => {
		for (const aspect of [0.5, 1, 1.8]) {
			const e = planExtent(points, { aspect });
			expect((e.xMaxM - e.xMinM) / (e.yMaxM - e.yMinM)).toBeCloseTo(aspect, 9);
		}
	});

	it('never shows less than the smallest span', () => {
		const e = planExtent([{ x: 1, y: 1 }], { aspect: 1, minSpanM: 20 });
		expect(e.xMaxM - e.xMinM).toBeGreaterThanOrEqual(20);
	});

	it('ignores points that are not numbers and copes with a bad aspect', () => {
		const e = planExtent([{ x: NaN, y: 5 }], { aspect: 0 });
		expect(Number.isFinite(e.xMinM) && Number.isFinite(e.yMaxM)).toBe(true);
	});

	it('keeps a dragged point on the plan', () => {
		const e = { xMinM: -10, xMaxM: 10, yMinM: -5, yMaxM: 5 };
		expect(clampToExtent(e, { x: 20, y: -9 })).toEqual({ x: 10, y: -5 });
	});
});

describe('scale bar length', () => {
	it('is the longest 1, 2 or 5 × 10ⁿ that fits', () => {
		expect(scaleBarLength(73)).toBe(50);
		expect(scaleBarLength(24)).toBe(20);
		expect(scaleBarLength(9.9)).toBe(5);
		expect(scaleBarLength(100)).toBe(100);
		expect(scaleBarLength(0)).toBe(0);
	});
});

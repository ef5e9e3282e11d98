import { describe, expect, it } from 'vitest';
import { boundaryMarks, levelChartSummary } from './level-distance';

const y = (db: number) => 200 - db; // 1 px per dB, upwards

describe('boundaryMarks', () => {
	it('says within when the predicted level is at or under the limit', () => {
		const marks = boundaryMarks(
			{ distanceM: 300, limitDb: 65, weighting: 'A', predictedDb: 64 },
			500,
			y,
			40,
			620
		);
		expect(marks.within).toBe(true);
		expect(marks.labelAnchor).toBe('end'); // right half of the plot: labels go left
	});
	it('pushes close labels apart, predicted above when it is over the limit', () => {
		const marks = boundaryMarks(
			{ distanceM: 300, limitDb: 65, weighting: 'C', predictedDb: 67 },
			100,
			y,
			40,
			620
		);
		expect(marks.within).toBe(false);
		expect(marks.predictedY! < marks.limitY).toBe(true);
		expect(marks.limitY - marks.predictedY!).toBeGreaterThanOrEqual(13);
	});
	it('has no dot when nothing is predicted', () => {
		expect(
			boundaryMarks(
				{ distanceM: 300, limitDb: 65, weighting: 'A', predictedDb: null },
				100,
				y,
				40,
				620
			).dotY
		).toBeNull();
	});
});

describe('levelChartSummary', () => {
	it('names the target, the fall-off and the boundary verdict', () => {
		const text = levelChartSummary({
			weighting: 'A',
			targetDb: 100,
			positionM: 30,
			unit: 'm',
			hasCurve: true,
			points: [
				{ distanceM: 30, levels: { A: 100, C: 110, Z: 112 } },
				{ distanceM: 300, levels: { A: 80, C: 92, Z: 94 } }
			],
			boundary: { distanceM: 300, limitDb: 75, weighting: 'A', predictedDb: 80 }
		});
		expect(text).toContain('100.0 dB(A) at front of house, 30 m from the system');
		expect(text).toContain('falling to 80.0 dB(A) at 300 m');
		expect(text).toContain('over the limit by 5.0 dB');
	});
});

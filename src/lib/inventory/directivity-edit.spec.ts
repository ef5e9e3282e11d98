import { describe, expect, it } from 'vitest';
import { addAngle, addBand, removeAngle, removeBand, setCell, tableErrors } from './directivity-edit';

const table = { anglesDeg: [0, 90, 180], bandsDb: { '63': [0, 2, 4], '1000': [0, 10, 20] } };

describe('editing a directivity table', () => {
	it('adds an angle in the widest gap with values halfway between the neighbours', () => {
		const { table: wider, index } = addAngle({ ...table, anglesDeg: [0, 60, 180] });
		expect(index).toBe(2);
		expect(wider.anglesDeg).toEqual([0, 60, 120, 180]);
		expect(wider.bandsDb['1000']).toEqual([0, 10, 15, 20]);
	});

	it('removes inner angles only, and bands; new bands copy the nearest band below', () => {
		expect(removeAngle(table, 1)).toEqual({ anglesDeg: [0, 180], bandsDb: { '63': [0, 4], '1000': [0, 20] } });
		expect(removeAngle(table, 0)).toBe(table);
		expect(removeBand(table, '63').bandsDb).toEqual({ '1000': [0, 10, 20] });
		expect(addBand(table, '125').bandsDb['125']).toEqual([0, 2, 4]);
		expect(addBand(table, '31.5').bandsDb['31.5']).toEqual([0, 2, 4]);
	});

	it('sets one cell without touching the original', () => {
		expect(setCell(table, '63', 2, 5).bandsDb['63']).toEqual([0, 2, 5]);
		expect(table.bandsDb['63']).toEqual([0, 2, 4]);
	});

	it('collects messages from a nested error tree once each', () => {
		expect(tableErrors({ bandsDb: { '125': { _errors: ['125 Hz: 2 values'], 1: ['x'] } }, anglesDeg: { _errors: ['x'] } }).sort()).toEqual(['125 Hz: 2 values', 'x']);
	});
});

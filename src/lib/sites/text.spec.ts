import { describe, expect, it } from 'vitest';
import type { ReceiverResult } from '../acoustics';
import { formatDb, levelUnit, limitText, marginText, resultFor } from './text';

const result = (name: string): ReceiverResult => ({
	name,
	distanceM: 100,
	offAxisDeg: 0,
	predictedDb: 61.24,
	limitDb: 65,
	weighting: 'A',
	bandHz: null,
	marginDb: 3.76,
	maxTargetDb: 100
});

describe('receiver text', () => {
	it('names the weighting or the band of a limit', () => {
		expect(levelUnit({ weighting: 'C' })).toBe('dB(C)');
		expect(limitText({ limitDb: 79, weighting: 'Z', bandHz: 63 })).toBe('limit 79.0 dB at 63 Hz');
	});

	it('says over or under in words', () => {
		expect(marginText(-2.04)).toBe('2.0 dB over');
		expect(marginText(0)).toBe('0.0 dB under');
		expect(marginText(null)).toBe('–');
		expect(formatDb(-Infinity)).toBe('–');
	});

	it('finds a receiver result by place, then by name', () => {
		const results = [result('Gate'), result('Church')];
		expect(resultFor(results, { name: 'Church' }, 1)).toBe(results[1]);
		expect(resultFor(results, { name: 'Church' }, 0)).toBe(results[1]);
		expect(resultFor(results, { name: 'Mill' }, 0)).toBeNull();
		expect(resultFor(null, { name: 'Gate' }, 0)).toBeNull();
	});
});

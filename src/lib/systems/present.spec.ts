import { describe, expect, it } from 'vitest';
import { obstacleLines } from './present';

describe('what stands in the way, in words', () => {
	it('gives the level a receiver allows with its weighting', () => {
		const lines = obstacleLines({ bandsShort: [], receiverOver: { name: 'Lane houses', maxTargetDb: 88.04 }, modelsRunOut: [] }, 'C');
		expect(lines).toEqual(['Receiver Lane houses would be over its limit at the level asked; its limit allows at most 88.0 dB(C) at the position']);
	});
});

import { describe, expect, it } from 'vitest';
import { systemSchema } from '$lib/schemas/systems';
import type { AmplifierModelRow, LoudspeakerModelRow } from '../inventory';
import { groupOf, type Chain } from './chains';
import { obstacleLines, patternSource, systemFormValue, systemGroups, systemName } from './present';

// Round-figure test models, not the demo stock.
const sub = { id: 11, name: 'Sub A', kind: 'subwoofer', impedanceOhm: 8, dayRateMinor: 3000 } as unknown as LoudspeakerModelRow;
const amp = { id: 21, name: 'Amp A', channels: 4, dayRateMinor: 4000 } as unknown as AmplifierModelRow;
const rearRejecting = { anglesDeg: [0, 90, 180], bandsDb: { '63': [0, 6, 20] } };
const chain = (pattern: Chain['pattern']): Chain => ({ role: 'sub', loudspeaker: sub, amplifier: amp, stacks: 2, cabinetsPerChannel: 1, pattern, minCount: 2, maxCount: 4, minDayCost: 0 });

describe('a suggested group with a group pattern', () => {
	it('names the pattern and the package it comes from, and keeps the table in the quote’s system body', () => {
		const patterned = groupOf(chain({ directivity: rearRejecting, from: 'Test package' }), 3, 1);
		const [group] = systemGroups([patterned], patternSource([{ directivity: rearRejecting, from: 'Test package' }]));
		expect(group).toMatchObject({ count: 3, stacks: 2, directivity: rearRejecting, patternFrom: 'Test package' });
		expect(systemName([patterned])).toBe('2 × 3 × Sub A (group pattern)');
		const body = systemSchema.parse(JSON.parse(systemFormValue({ groups: [group] })));
		expect(body.groups[0].directivity).toEqual(rearRejecting);
	});

	it('leaves a plain group without a pattern', () => {
		const [group] = systemGroups([groupOf(chain(null), 2, 0)]);
		expect(group).toMatchObject({ directivity: null, patternFrom: null });
		expect(JSON.parse(systemFormValue({ groups: [group] })).groups[0]).not.toHaveProperty('directivity');
	});
});

describe('what stands in the way, in words', () => {
	it('gives the level a receiver allows with its weighting', () => {
		const lines = obstacleLines({ bandsShort: [], receiverOver: { name: 'Lane houses', maxTargetDb: 88.04 }, modelsRunOut: [] }, 'C');
		expect(lines).toEqual(['Receiver Lane houses would be over its limit at the level asked; its limit allows at most 88.0 dB(C) at the position']);
	});
});

import { describe, expect, it } from 'vitest';
import { systemSchema } from '$lib/schemas/systems';
import { composedError, composedFrom, composedFromFormValue, composedSystem, editedGroup, emptyGroup, systemWideErrors } from './compose';

describe('the composer’s groups', () => {
	it('start from a package’s groups as own copies, and go back as a system the schema takes', () => {
		const source = [{ id: 9, position: 0, loudspeakerModelId: 3, count: 4, stacks: 2, amplifierModelId: 5, cabinetsPerChannel: 2, flown: false, heightM: 0.6, spacingM: 12 }];
		const groups = composedFrom(source);
		groups[0].count = 5;
		expect(source[0].count).toBe(4);
		const body = composedSystem(groups);
		expect(body.groups[0]).toEqual({ loudspeakerModelId: 3, count: 5, stacks: 2, amplifierModelId: 5, cabinetsPerChannel: 2, heightM: 0.6, spacingM: 12, flown: false });
		expect(systemSchema.safeParse(body).success).toBe(true);
	});

	it('leave empty placement out, so the model’s usual height applies', () => {
		expect(composedSystem([{ ...emptyGroup(), loudspeakerModelId: 1, amplifierModelId: 2 }]).groups[0]).not.toHaveProperty('heightM');
	});

	it('a group with no model chosen is refused on that field', () => {
		const parsed = systemSchema.safeParse(composedSystem([emptyGroup()]));
		expect(parsed.success).toBe(false);
		expect(parsed.error!.issues.map((i) => i.path.join('.'))).toContain('groups.0.loudspeakerModelId');
	});

	it('more cabinets per channel than the stack has is refused, as for a package', () => {
		const parsed = systemSchema.safeParse(composedSystem([{ ...emptyGroup(), loudspeakerModelId: 1, amplifierModelId: 2, count: 1, cabinetsPerChannel: 2 }]));
		expect(parsed.error!.issues[0].path).toEqual(['groups', 0, 'cabinetsPerChannel']);
	});

	it('read back from the hidden form field; anything else is no system', () => {
		expect(composedFromFormValue(JSON.stringify({ groups: [{ loudspeakerModelId: 1, count: 2, stacks: 1, amplifierModelId: 2, cabinetsPerChannel: 1, heightM: null }] }))).toHaveLength(1);
		expect(composedFromFormValue('')).toBeNull();
		expect(composedFromFormValue('{not json')).toBeNull();
		expect(composedFromFormValue('{"groups":[]}')).toBeNull();
	});

	it('find the API’s errors by group and field', () => {
		const errors = { 'system.groups.1.count': ['At most 64'], 'system.groups': ['At most 6 groups'] };
		expect(composedError(errors, 1, 'count')).toBe('At most 64');
		expect(composedError(errors, 0, 'count')).toBeUndefined();
		expect(systemWideErrors(errors)).toEqual(['At most 6 groups']);
	});

	it('keep a group pattern taken from a suggestion until the desk chooses another loudspeaker model', () => {
		// A round-figure rear-rejecting table, not a product's data.
		const directivity = { anglesDeg: [0, 90, 180], bandsDb: { '63': [0, 6, 20] } };
		const [group] = composedFrom([{ loudspeakerModelId: 3, count: 4, stacks: 2, amplifierModelId: 5, cabinetsPerChannel: 2, directivity }]);
		expect(composedSystem([group]).groups[0].directivity).toEqual(directivity);
		expect(systemSchema.safeParse(composedSystem([group])).success).toBe(true);
		expect(editedGroup(group, 'count', 6).directivity).toEqual(directivity);
		expect(editedGroup(group, 'loudspeakerModelId', 4)).not.toHaveProperty('directivity');
	});
});

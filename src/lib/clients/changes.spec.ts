import { describe, expect, it } from 'vitest';
import { changedFields, likePattern } from './changes';

describe('client record changes', () => {
	it('lists only the fields whose value really changed', () => {
		const current = { name: 'Harbour Arts', email: 'old@example.test', phone: null, notes: '' };
		const next = { name: 'Harbour Arts', email: 'new@example.test', phone: '', notes: 'Prefers mornings' };
		expect(changedFields(current, next)).toEqual([
			{ field: 'email', oldValue: 'old@example.test', newValue: 'new@example.test' },
			{ field: 'notes', oldValue: null, newValue: 'Prefers mornings' }
		]);
	});

	it('ignores fields the edit did not send', () => {
		expect(changedFields({ name: 'A' }, { name: undefined })).toEqual([]);
	});

	it('escapes LIKE wildcards so a search for 100% finds the text, not everything', () => {
		expect(likePattern(' 100%_off ')).toBe('%100\\%\\_off%');
		expect(likePattern('   ')).toBeNull();
	});
});

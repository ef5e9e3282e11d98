import { describe, expect, it } from 'vitest';
import { closeRefusal, progressInWords, stateAfterScan } from './states';

describe('booking states', () => {
	it('the first unit out moves confirmed → out; the last unit back moves out → back', () => {
		expect(stateAfterScan({ state: 'confirmed', needed: 4, dispatched: 1, returned: 0 })).toBe('out');
		expect(stateAfterScan({ state: 'out', needed: 4, dispatched: 4, returned: 3 })).toBe('out');
		expect(stateAfterScan({ state: 'out', needed: 4, dispatched: 4, returned: 4 })).toBe('back');
		expect(stateAfterScan({ state: 'out', needed: 4, dispatched: 2, returned: 2 })).toBe('back');
	});

	it('closing waits for every unit that went out', () => {
		expect(closeRefusal({ state: 'out', needed: 4, dispatched: 4, returned: 1 })).toMatch(/3 units are still out/);
		expect(closeRefusal({ state: 'confirmed', needed: 4, dispatched: 0, returned: 0 })).toMatch(/Nothing has gone out/);
		expect(closeRefusal({ state: 'back', needed: 4, dispatched: 4, returned: 4 })).toBeNull();
	});

	it('says where a hire stands in plain words', () => {
		expect(progressInWords({ state: 'out', needed: 8, dispatched: 6, returned: 0 })).toBe('Partly out: 6 of 8 units have left the warehouse.');
		expect(progressInWords({ state: 'out', needed: 8, dispatched: 8, returned: 3 })).toBe('Partly back: 3 of 8 units returned, 5 still with you.');
		expect(progressInWords({ state: 'closed', needed: 8, dispatched: 8, returned: 8 })).toMatch(/^Closed/);
	});
});

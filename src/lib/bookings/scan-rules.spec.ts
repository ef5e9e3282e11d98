import { describe, expect, it } from 'vitest';
import { dispatchRefusal, returnRefusal, type DispatchFacts } from './scan-rules';

const good: DispatchFacts = {
	bookingState: 'confirmed',
	serial: 'AB-1',
	unit: { status: 'ready', modelName: 'Top' },
	line: { needed: 2, dispatched: 0 },
	outHere: false,
	outOn: null,
	reservedFor: null,
	test: 'in-date',
	testDue: '2027-01-01'
};

describe('scan rules', () => {
	it('lets a ready, tested unit of a needed model go out', () => {
		expect(dispatchRefusal(good)).toBeNull();
		expect(dispatchRefusal({ ...good, test: 'due-soon' })).toBeNull();
	});

	it('refuses with the reason', () => {
		expect(dispatchRefusal({ ...good, unit: null })).toMatch(/No unit has the serial AB-1/);
		expect(dispatchRefusal({ ...good, line: null })).toMatch(/does not need/);
		expect(dispatchRefusal({ ...good, outOn: 'Q-00012' })).toMatch(/out on booking Q-00012/);
		expect(dispatchRefusal({ ...good, reservedFor: 'Q-00013' })).toMatch(/reserved for booking Q-00013/);
		expect(dispatchRefusal({ ...good, unit: { status: 'retired', modelName: 'Top' } })).toMatch(/retired/);
		expect(dispatchRefusal({ ...good, test: 'overdue' })).toMatch(/overdue.*due 1 Jan 2027/);
		expect(dispatchRefusal({ ...good, line: { needed: 2, dispatched: 2 } })).toMatch(/All 2 Top/);
		expect(dispatchRefusal({ ...good, bookingState: 'back' })).toMatch(/is back/);
	});

	it('takes back only what went out on this booking', () => {
		const facts = { bookingState: 'out' as const, serial: 'AB-1', known: true, outHere: true, returnedHere: false };
		expect(returnRefusal(facts)).toBeNull();
		expect(returnRefusal({ ...facts, outHere: false })).toMatch(/did not go out/);
		expect(returnRefusal({ ...facts, outHere: false, returnedHere: true })).toMatch(/already scanned back/);
		expect(returnRefusal({ ...facts, bookingState: 'confirmed' })).toMatch(/nothing out/);
	});
});

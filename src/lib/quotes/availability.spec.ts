import { describe, expect, it } from 'vitest';
import { checkAvailability, reservedOn, type Reservation } from './availability';
import { datesOverlap, hireDays } from './hire-days';

const booking = (startDate: string, endDate: string, qty: number): Reservation => ({
	startDate,
	endDate,
	quantities: { 'loudspeaker:1': qty }
});

describe('hire dates', () => {
	it('count both ends', () => {
		expect(hireDays('2027-06-12', '2027-06-12')).toBe(1);
		expect(hireDays('2027-06-12', '2027-06-14')).toBe(3);
		expect(hireDays('2027-02-27', '2027-03-01')).toBe(3);
	});
	it('overlap when they share a day, including the edges', () => {
		expect(datesOverlap('2027-06-01', '2027-06-05', '2027-06-05', '2027-06-08')).toBe(true);
		expect(datesOverlap('2027-06-01', '2027-06-04', '2027-06-05', '2027-06-08')).toBe(false);
		expect(datesOverlap('2027-06-01', '2027-06-30', '2027-06-10', '2027-06-11')).toBe(true);
	});
});

describe('availability', () => {
	const reservations = [
		booking('2027-06-01', '2027-06-03', 4), // before
		booking('2027-06-10', '2027-06-12', 3), // overlaps the start
		booking('2027-06-14', '2027-06-20', 2), // overlaps the end
		booking('2027-06-21', '2027-06-25', 8) // after
	];

	it('subtracts only bookings that overlap the hire dates', () => {
		expect(reservedOn(reservations, '2027-06-12', '2027-06-14')).toEqual({ 'loudspeaker:1': 5 });
		expect(reservedOn(reservations, '2027-06-04', '2027-06-09')).toEqual({});
	});

	it('says which model is short and by how many', () => {
		const result = checkAvailability({ 'loudspeaker:1': 6, 'amplifier:2': 1 }, { 'loudspeaker:1': 10, 'amplifier:2': 1 }, reservations, '2027-06-12', '2027-06-14');
		expect(result.ok).toBe(false);
		expect(result.shortfalls).toEqual([{ model: 'loudspeaker:1', needed: 6, available: 5, missing: 1 }]);
		expect(result.free).toEqual({ 'loudspeaker:1': 5, 'amplifier:2': 1 });
	});

	it('is fine when enough units are free, and never reports negative stock', () => {
		expect(checkAvailability({ 'loudspeaker:1': 2 }, { 'loudspeaker:1': 2 }, [], '2027-06-01', '2027-06-01').ok).toBe(true);
		const over = checkAvailability({ 'loudspeaker:1': 1 }, { 'loudspeaker:1': 1 }, [booking('2027-06-01', '2027-06-01', 3)], '2027-06-01', '2027-06-01');
		expect(over.shortfalls[0]).toMatchObject({ available: 0, missing: 1 });
	});
});

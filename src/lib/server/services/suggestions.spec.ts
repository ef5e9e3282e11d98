import { describe, expect, it } from 'vitest';
import { useTestDatabase } from '../../../../tests/helpers/db';
import { DomainError } from './errors';
import { SearchBusyError } from '../search/run-search';
import { beginSuggestions, suggestForDesk } from './suggestions';

useTestDatabase();

const request = {
	targetDb: 96, weighting: 'A' as const, distance: 25, distanceUnit: 'm' as const, programme: 'speech',
	temperatureC: 20, humidityPct: 50, startDate: '2031-08-10', endDate: '2031-08-11'
};

describe('suggestForDesk', () => {
	it('answers clear, available systems from the stock, cheapest first', async () => {
		const found = await suggestForDesk(request);
		expect(found.systems.length).toBeGreaterThan(0);
		for (const s of found.systems) {
			expect(s.outcome).toBe('clear');
			expect(s.availability.ok).toBe(true);
		}
		const subtotals = found.systems.map((s) => s.price.subtotalMinor);
		expect(subtotals).toEqual([...subtotals].sort((a, b) => a - b));
	}, 30_000);

	it('refuses an unknown programme like an evaluation does', async () => {
		await expect(suggestForDesk({ ...request, programme: 'no-such-profile' })).rejects.toBeInstanceOf(DomainError);
	});

	it('searches in a worker thread, one at a time per process: a second search meanwhile is refused as busy', async () => {
		const first = await beginSuggestions(request);
		const second = beginSuggestions(request);
		await expect(second).rejects.toBeInstanceOf(SearchBusyError);
		await expect(second).rejects.toMatchObject({ status: 503, retryAfterSeconds: expect.any(Number) });
		const answer = await first.answer();
		expect(answer.systems.length).toBeGreaterThan(0);
		// The place is given back when the search ends.
		expect((await suggestForDesk(request)).systems.length).toBeGreaterThan(0);
	}, 30_000);
});

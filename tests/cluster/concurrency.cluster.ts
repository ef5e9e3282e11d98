/**
 * Many requests at once through the proxy: every one answered correctly, both processes serving.
 */
import { describe, expect, it } from 'vitest';
import { call, PROXY, SALES, signIn } from './cluster';

const request = { targetDb: 95, weighting: 'A', distance: 25, distanceUnit: 'm', programme: 'speech', startDate: '2035-08-02', endDate: '2035-08-03' };

describe('two processes behind the proxy', () => {
	it('answers 60 concurrent evaluations and page loads, spread over both processes', async () => {
		const sales = await signIn(SALES);
		const answers = await Promise.all(
			Array.from({ length: 60 }, (_, i) =>
				i % 3 === 0
					? call(PROXY, '/quotes', { cookie: sales })
					: call(PROXY, '/api/evaluations', { cookie: sales, method: 'POST', body: request })
			)
		);
		expect(answers.map((a) => a.status)).toEqual(answers.map(() => 200));
		const evaluations = answers.filter((_, i) => i % 3 !== 0);
		const first = JSON.stringify(evaluations[0].json.results);
		expect(evaluations.every((a) => JSON.stringify(a.json.results) === first)).toBe(true);
		expect(new Set(answers.map((a) => a.upstream)).size).toBe(2);
	});

	it('keeps one session across processes: signed in on one, known on the other', async () => {
		const sales = await signIn(SALES);
		const seen = await Promise.all(Array.from({ length: 6 }, () => call(PROXY, '/api/quotes', { cookie: sales })));
		expect(seen.every((a) => a.status === 200)).toBe(true);
		expect(new Set(seen.map((a) => a.upstream)).size).toBe(2);
	});
});

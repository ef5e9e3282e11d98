import { describe, expect, it } from 'vitest';
import { allowedActions, nextStatus, QUOTE_ACTIONS, QUOTE_STATUSES } from './states';

describe('quote states', () => {
	it('follows the happy path from draft to closed', () => {
		let status = nextStatus('draft', 'send')!;
		expect(status).toBe('sent');
		status = nextStatus(status, 'accept')!;
		expect(status).toBe('accepted');
		status = nextStatus(status, 'pay-deposit')!;
		expect(status).toBe('deposit-paid');
		status = nextStatus(status, 'confirm')!;
		expect(status).toBe('confirmed');
		expect(nextStatus(status, 'close')).toBe('closed');
	});

	it('refuses illegal moves', () => {
		expect(nextStatus('draft', 'accept')).toBeNull();
		expect(nextStatus('sent', 'confirm')).toBeNull();
		expect(nextStatus('accepted', 'revise')).toBeNull();
		expect(nextStatus('cancelled', 'send')).toBeNull();
	});

	it('ends in closed or cancelled, and nothing leaves them', () => {
		expect(allowedActions('closed')).toEqual([]);
		expect(allowedActions('cancelled')).toEqual([]);
		for (const status of QUOTE_STATUSES) {
			for (const action of QUOTE_ACTIONS) {
				const next = nextStatus(status, action);
				if (next) expect(QUOTE_STATUSES).toContain(next);
			}
		}
	});

	it('can be cancelled from every live state', () => {
		for (const status of ['draft', 'sent', 'accepted', 'deposit-paid', 'confirmed'] as const) {
			expect(nextStatus(status, 'cancel')).toBe('cancelled');
		}
	});
});

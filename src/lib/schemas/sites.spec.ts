import { describe, expect, it } from 'vitest';
import { inlineSiteSchema, siteSchema, siteUpdateSchema } from './sites';

const receiver = { name: 'House', x: 10, y: -40, limitDb: 55, weighting: 'A' };

function errorsOf(result: { success: boolean; error?: { issues: { path: PropertyKey[]; message: string }[] } }) {
	return Object.fromEntries((result.error?.issues ?? []).map((i) => [i.path.join('.'), i.message]));
}

describe('siteSchema', () => {
	it('fills defaults for a minimal site', () => {
		const site = siteSchema.parse({ name: 'Field', receivers: [receiver] });
		expect(site).toMatchObject({ ground: 'mixed', groundFactor: null, aimDeg: 0, positionHeightM: 1.5, allowanceDb: 0, units: 'm' });
		expect(site.receivers[0]).toMatchObject({ heightM: 1.5, bandHz: null, period: '', notes: '' });
	});

	it('puts a missing receiver limit on that receiver’s field', () => {
		const { limitDb: _l, ...noLimit } = receiver;
		const errors = errorsOf(siteSchema.safeParse({ name: 'Field', receivers: [receiver, { ...noLimit, name: 'Church' }] }));
		expect(Object.keys(errors)).toEqual(['receivers.1.limitDb']);
	});

	it('refuses a G outside 0…1 and a custom ground without G', () => {
		expect(Object.keys(errorsOf(siteSchema.safeParse({ name: 'Field', ground: 'custom', groundFactor: 1.2 })))).toEqual(['groundFactor']);
		expect(Object.keys(errorsOf(siteSchema.safeParse({ name: 'Field', ground: 'custom', groundFactor: -0.1 })))).toEqual(['groundFactor']);
		expect(Object.keys(errorsOf(siteSchema.safeParse({ name: 'Field', ground: 'custom' })))).toEqual(['groundFactor']);
		expect(siteSchema.safeParse({ name: 'Field', ground: 'custom', groundFactor: 0.3 }).success).toBe(true);
	});

	it('accepts only the 63 and 125 Hz bands for a band limit', () => {
		expect(siteSchema.safeParse({ name: 'Field', receivers: [{ ...receiver, bandHz: 63 }] }).success).toBe(true);
		expect(Object.keys(errorsOf(siteSchema.safeParse({ name: 'Field', receivers: [{ ...receiver, bandHz: 250 }] })))).toEqual(['receivers.0.bandHz']);
	});

	it('wants a distinct name per receiver (results name the receiver that binds)', () => {
		const errors = errorsOf(siteSchema.safeParse({ name: 'Field', receivers: [receiver, { ...receiver, name: ' house ' }] }));
		expect(Object.keys(errors)).toEqual(['receivers.1.name']);
	});

	it('refuses an aim bearing outside 0…360 and a negative allowance', () => {
		const errors = errorsOf(siteSchema.safeParse({ name: 'Field', aimDeg: 400, allowanceDb: -1 }));
		expect(Object.keys(errors).sort()).toEqual(['aimDeg', 'allowanceDb']);
	});
});

describe('siteUpdateSchema', () => {
	it('takes a partial change and refuses unknown fields', () => {
		expect(siteUpdateSchema.safeParse({ allowanceDb: 3 }).success).toBe(true);
		expect(siteUpdateSchema.safeParse({ colour: 'red' }).success).toBe(false);
		expect(Object.keys(errorsOf(siteUpdateSchema.safeParse({ groundFactor: 2 })))).toEqual(['groundFactor']);
	});
});

describe('inlineSiteSchema', () => {
	it('needs no name', () => {
		expect(inlineSiteSchema.parse({ receivers: [receiver] }).name).toBeTruthy();
	});
});

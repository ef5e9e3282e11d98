// The prepared-package cache (groups.ts): prepared once per package object, never stale when the
// groups list or a group is replaced.
import { describe, expect, it } from 'vitest';
import { group, request } from '../../../tests/helpers/acoustics/fixtures';
import { evaluatePackage } from './evaluate';
import { preparePackage } from './groups';

describe('preparePackage cache', () => {
	it('prepares a package object once', () => {
		const pkg = { groups: [group()] };
		expect(preparePackage(pkg)).toBe(preparePackage(pkg));
	});

	it('sees a replaced group, an added group and a replaced groups list', () => {
		const pkg = { groups: [group()] };
		const before = evaluatePackage(pkg, request()).bands[0].capabilityDb;
		pkg.groups[0] = group({ count: 2 });
		const replaced = evaluatePackage(pkg, request()).bands[0].capabilityDb;
		expect(replaced - before).toBeCloseTo(10 * Math.log10(2), 12);
		pkg.groups.push(group({ count: 2 }));
		expect(evaluatePackage(pkg, request()).bands[0].capabilityDb - replaced).toBeCloseTo(
			10 * Math.log10(2),
			12
		);
		pkg.groups = [group()];
		expect(evaluatePackage(pkg, request()).bands[0].capabilityDb).toBeCloseTo(before, 12);
	});

	it('does not cache a package that fails its checks', () => {
		const pkg = { groups: [group({ count: 0 })] };
		expect(() => evaluatePackage(pkg, request())).toThrow(/cabinet count/);
		expect(() => evaluatePackage(pkg, request())).toThrow(/cabinet count/);
	});
});

// Decodes Stripe's form encoding (`metadata[quoteId]=1`, `expand[0]=customer`, `expand[]=x`) into nested
// objects, and reads typed values out of it with Stripe's validation errors.
import { invalid, invalidInteger, missingParam, unknownParam } from './errors';

export type ParamValue = string | Params | ParamValue[];
export interface Params {
	[key: string]: ParamValue;
}

function setPath(target: Params | ParamValue[], segments: string[], value: string): void {
	const [head, ...rest] = segments;
	const isArray = Array.isArray(target);
	const key = head === '' && isArray ? String(target.length) : head;
	if (rest.length === 0) {
		(target as Record<string, ParamValue>)[key] = value;
		return;
	}
	const nextIsArray = rest[0] === '' || /^\d+$/.test(rest[0]);
	const bag = target as Record<string, ParamValue>;
	let child = bag[key];
	if (typeof child !== 'object' || child === null) {
		child = nextIsArray ? [] : {};
		bag[key] = child;
	}
	setPath(child, rest, value);
}

export function parseForm(body: string): Params {
	const out: Params = {};
	for (const [rawKey, value] of new URLSearchParams(body)) {
		const match = /^([^[\]]+)((?:\[[^[\]]*\])*)$/.exec(rawKey);
		if (!match) throw invalid(`Invalid parameter name: ${rawKey}`);
		const segments = [match[1], ...[...match[2].matchAll(/\[([^[\]]*)\]/g)].map((m) => m[1])];
		setPath(out, segments, value);
	}
	return out;
}

/** Stripe refuses parameters it does not know; so does the fake, so a typo fails here and not in production. */
export function allowOnly(params: Params, allowed: readonly string[]): void {
	for (const key of Object.keys(params)) if (!allowed.includes(key)) throw unknownParam(key);
}

export function str(params: Params, name: string): string | undefined {
	const v = params[name];
	if (v === undefined || v === '') return undefined;
	if (typeof v !== 'string')
		throw invalid(`Invalid string: ${name}`, 'parameter_invalid_string', name);
	return v;
}

export function requiredStr(params: Params, name: string): string {
	const v = str(params, name);
	if (v === undefined) throw missingParam(name);
	return v;
}

export function int(params: Params, name: string): number | undefined {
	const v = str(params, name);
	if (v === undefined) return undefined;
	if (!/^-?\d+$/.test(v)) throw invalidInteger(name, v);
	return Number(v);
}

export function bool(params: Params, name: string): boolean | undefined {
	const v = str(params, name);
	if (v === undefined) return undefined;
	if (v !== 'true' && v !== 'false')
		throw invalid(`Invalid boolean: ${v}`, 'parameter_invalid_boolean', name);
	return v === 'true';
}

export function oneOf<T extends string>(
	params: Params,
	name: string,
	values: readonly T[]
): T | undefined {
	const v = str(params, name);
	if (v === undefined) return undefined;
	if (!values.includes(v as T))
		throw invalid(
			`Invalid ${name}: must be one of ${values.join(', ')}`,
			'parameter_invalid_string',
			name
		);
	return v as T;
}

/** Metadata is a flat map of strings; an empty value removes the key, as on Stripe. */
export function metadata(
	params: Params,
	current: Record<string, string> = {}
): Record<string, string> {
	const v = params.metadata;
	if (v === undefined) return current;
	if (v === '') return {};
	if (typeof v !== 'object' || Array.isArray(v))
		throw invalid('Invalid object', 'parameter_invalid_object', 'metadata');
	const next = { ...current };
	for (const [k, val] of Object.entries(v)) {
		if (typeof val !== 'string')
			throw invalid(
				`Invalid metadata value for ${k}`,
				'parameter_invalid_string',
				`metadata[${k}]`
			);
		if (val === '') delete next[k];
		else next[k] = val;
	}
	return next;
}

export function expandList(params: Params): string[] {
	const v = params.expand;
	if (v === undefined) return [];
	const list = Array.isArray(v) ? v : typeof v === 'object' ? Object.values(v) : [v];
	return list.filter((x): x is string => typeof x === 'string');
}

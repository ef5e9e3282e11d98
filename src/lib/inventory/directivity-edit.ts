import type { DirectivityTable } from '$lib/schemas/directivity';
import { NOMINAL_BANDS, type NominalBandKey } from '$lib/schemas/programmes';

/**
 * Edits of a directivity table as the grid makes them. Each returns a new table (the form store sees
 * the change); none validates — the shared schema does that when the form is saved.
 */

type Rows = DirectivityTable['bandsDb'];
const mapRows = (rows: Rows, f: (row: number[], band: NominalBandKey) => number[]): Rows =>
	Object.fromEntries(Object.entries(rows).map(([band, row]) => [band, f(row as number[], band as NominalBandKey)]));

export function setCell(table: DirectivityTable, band: NominalBandKey, col: number, value: number): DirectivityTable {
	return { ...table, bandsDb: mapRows(table.bandsDb, (row, b) => (b === band ? row.map((v, i) => (i === col ? value : v)) : row)) };
}

export function setAngle(table: DirectivityTable, col: number, angle: number): DirectivityTable {
	return { ...table, anglesDeg: table.anglesDeg.map((a, i) => (i === col ? angle : a)) };
}

const round = (x: number) => Math.round(x * 10) / 10;

/**
 * A new column in the middle of the widest gap between angles, its values halfway between the
 * neighbours' (the model interpolates linearly in angle too, so predictions do not move until edited).
 */
export function addAngle(table: DirectivityTable): { table: DirectivityTable; index: number } {
	const a = table.anglesDeg;
	let index = 1;
	for (let i = 1; i < a.length; i++) if (a[i] - a[i - 1] > a[index] - a[index - 1]) index = i;
	const angle = round((a[index - 1] + a[index]) / 2);
	const insert = <T>(list: T[], item: T) => [...list.slice(0, index), item, ...list.slice(index)];
	return {
		table: {
			anglesDeg: insert(a, angle),
			bandsDb: mapRows(table.bandsDb, (row) => insert(row, round(((row[index - 1] ?? 0) + (row[index] ?? 0)) / 2)))
		},
		index
	};
}

/** Removes an angle between 0° and 180° (those two always stay). */
export function removeAngle(table: DirectivityTable, col: number): DirectivityTable {
	if (col <= 0 || col >= table.anglesDeg.length - 1) return table;
	return { anglesDeg: table.anglesDeg.filter((_, i) => i !== col), bandsDb: mapRows(table.bandsDb, (row) => row.filter((_, i) => i !== col)) };
}

/** A new band row, starting as a copy of the nearest band below it (else above, else zeros). */
export function addBand(table: DirectivityTable, band: NominalBandKey): DirectivityTable {
	const at = NOMINAL_BANDS.indexOf(band);
	const below = NOMINAL_BANDS.slice(0, at).reverse().find((b) => table.bandsDb[b]);
	const above = NOMINAL_BANDS.slice(at + 1).find((b) => table.bandsDb[b]);
	const source = table.bandsDb[below ?? above ?? band];
	const row = source && source.length === table.anglesDeg.length ? [...source] : table.anglesDeg.map(() => 0);
	return { ...table, bandsDb: { ...table.bandsDb, [band]: row } };
}

export function removeBand(table: DirectivityTable, band: NominalBandKey): DirectivityTable {
	const { [band]: _removed, ...rest } = table.bandsDb;
	return { ...table, bandsDb: rest };
}

/** Every message in a superforms error tree for the table, with cell messages once each. */
export function tableErrors(errors: unknown): string[] {
	const found = new Set<string>();
	const walk = (node: unknown) => {
		if (typeof node === 'string') found.add(node);
		else if (Array.isArray(node)) node.forEach(walk);
		else if (node && typeof node === 'object') Object.values(node).forEach(walk);
	};
	walk(errors);
	return [...found];
}


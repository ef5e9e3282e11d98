/**
 * TEMPORARY until the v2 model (levelGrid) lands: a radial stand-in built from the v1 level curve,
 * ignoring aim, directivity and ground. Replaced by a re-export of `levelGrid` from $lib/acoustics.
 */
import { levelCurve, type Grid, type LevelGrid, type PackageSpec, type QuoteRequest } from '../acoustics';

export function computeLevelGrid(pkg: PackageSpec, request: QuoteRequest, grid: Grid): LevelGrid {
	const nx = Math.floor((grid.xMaxM - grid.xMinM) / grid.stepM) + 1;
	const ny = Math.floor((grid.yMaxM - grid.yMinM) / grid.stepM) + 1;
	const distances: number[] = [];
	for (let j = 0; j < ny; j++)
		for (let i = 0; i < nx; i++)
			distances.push(Math.max(1, Math.hypot(grid.xMinM + i * grid.stepM, grid.yMinM + j * grid.stepM)));
	const curve = levelCurve(pkg, request, distances);
	const levels = new Float64Array(nx * ny);
	curve.forEach((p, k) => {
		const v = p.levels[grid.weighting];
		levels[k] = Number.isFinite(v) ? v : NaN;
	});
	return { nx, ny, levels };
}

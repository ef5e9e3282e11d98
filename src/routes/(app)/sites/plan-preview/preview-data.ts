/**
 * An invented site and a simple package for the plan preview only (typed here, not from the
 * catalogue): two full-range stacks and two sub stacks on a field with three neighbours.
 * The figures are plausible round numbers, not any maker's data.
 */
import type { AmplifierSpec, PackageSpec, QuoteRequest, Site } from '$lib/acoustics';

const amplifier: AmplifierSpec = { channels: 4, powerW: { 8: 1300, 4: 2200, 2: 3000 }, minLoadOhm: 2 };

export const previewPackage: PackageSpec = {
	groups: [
		{
			loudspeaker: {
				kind: 'full-range',
				sensitivityDb: 100,
				sensitivityRef: '1W',
				impedanceOhm: 8,
				powerContinuousW: 800,
				dispersionHDeg: 90,
				dispersionVDeg: 40,
				lowHz: 60,
				highHz: 18000
			},
			count: 2,
			stacks: 2,
			amplifier,
			cabinetsPerChannel: 1,
			heightM: 3,
			spacingM: 14
		},
		{
			loudspeaker: {
				kind: 'subwoofer',
				sensitivityDb: 99,
				sensitivityRef: '1W',
				impedanceOhm: 8,
				powerContinuousW: 1200,
				dispersionHDeg: 360,
				dispersionVDeg: 360,
				lowHz: 31.5,
				highHz: 125
			},
			count: 2,
			stacks: 2,
			amplifier,
			cabinetsPerChannel: 1,
			heightM: 0.6,
			spacingM: 14
		}
	]
};

export const previewRequest: Omit<QuoteRequest, 'site'> = {
	targetDb: 92,
	weighting: 'A',
	distanceM: 35,
	audienceWidthM: 40,
	programme: {
		bandsDb: { 63: 0, 125: 0, 250: -3, 500: -5, 1000: -7, 2000: -9, 4000: -11, 8000: -14 },
		crestFactorDb: 12
	},
	air: { temperatureC: 15, humidityPct: 70 }
};

export const previewSite: Site = {
	aimDeg: 20,
	groundFactor: 0.7,
	positionHeightM: 1.5,
	allowanceDb: 0,
	receivers: [
		{ name: 'Lane houses', x: -170, y: 240, limitDb: 65, weighting: 'A' },
		{ name: 'Farm cottage', x: 250, y: -90, limitDb: 60, weighting: 'A' },
		{ name: 'Chapel', x: 60, y: 330, limitDb: 80, weighting: 'C' }
	]
};

/** Inventory helpers shared by the warehouse pages and the quoting engine. Pure: no I/O, no server imports. */
export { toLoudspeakerSpec, toAmplifierSpec, toPackageSpec } from './to-spec';
export { packageBillOfMaterials, channelsNeeded, type BillOfMaterials, type BillLine, type AmplifierBillLine, type FlownHang } from './bill-of-materials';
export { LOUDSPEAKER_CSV_COLUMNS, AMPLIFIER_CSV_COLUMNS, serialiseCsv, parseModelsCsv, csvErrorEnvelope, type ParsedCsv, type CsvRow } from './csv';
export * from './types';
export { channelPlanErrors, channelLoadOhm, type PlannedGroup } from './channel-plan';

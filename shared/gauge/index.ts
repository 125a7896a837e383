/** Gauge log core: judging readings against a signed sheet's snapshot, grouping, units, CSV safety. */
export { createMarginJudge, type MarginJudge, type MarginJudgeOptions, type ReadingTemperatures, type ThicknessLimits } from './create-margin-judge';
export { escapeCsvCell } from './escape-csv-cell';
export * from './group-spots-and-areas';
export * from './read-reading-rows';
export { readingFlag, readingFlagLabels, readingFlagValues, type ReadingFlag } from './reading-flag';
export { frozenFluidLaws, snapshotLayerFields, type GaugeSnapshot } from './snapshot-layer';
export { snapshotMarginAt } from './snapshot-margin-at';
export { dryThicknessFromWet, thinnedVolumeSolids, wetThicknessFromDry } from './wet-dry';

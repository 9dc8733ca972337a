/**
 * Annual runs (a year, or a range of dates): statistics gathered by a sink while the run goes, and
 * the `annual` section of summary.json made from them.
 */
export { AnnualRecorder, epochDayOf, type AnnualParts, type AnnualOptions } from './recorder.ts';
export { annualSummary, annualVerdicts, governingCycles, monthsBetween } from './figures.ts';
export { MonthlyDewHours, type SecondsBelow } from './dewHours.ts';
export { WallExtremesByMonth } from './extremes.ts';
export { ThermalCycles, differencesOf, governs, regroup, reportBinWidth, STREAM_BIN_K, type ColumnCycles, type Difference } from './cycles.ts';
export { MarginGrid } from './marginGrid.ts';

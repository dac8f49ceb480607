// The public library API of quakesweep: re-exports only. See README.md for examples.

export {
  type AnchorageAnalysis,
  analyseAnchorage,
  type DemandChoice,
} from './anchorage/anchorage.js';
export { type Equipment, parseEquipment } from './anchorage/equipment.js';
export { CAUTION, cautionLines } from './base/caution.js';
export { type ErrorKind, inputError, isQuakesweepError, QuakesweepError, usageError } from './base/errors.js';
export * from './base/units.js';
export { VERSION } from './base/version.js';
// Suites: each record scaled to a target, the check of the suite mean against a fraction of it.
export { analyseSuite, type SuiteAnalysis } from './batch/suite.js';
export { checkSuite, structurePeriodRange } from './batch/suite-check.js';
export { ductilityDemandToCsv, ductilityToCsv } from './formats/ductility-csv.js';
export { ductilityDemandToJson, ductilityToJson } from './formats/ductility-json.js';
export { ductilityDemandTable, ductilityTable } from './formats/ductility-table.js';
export { floorSetTable, floorSetToCsv, floorSetToJson } from './formats/floor-set.js';
export { spectrumToCsv } from './formats/spectrum-csv.js';
export { formatJson, type SpectrumJson, spectrumToJson } from './formats/spectrum-json.js';
export {
  constantDuctilitySpectra,
  type DemandSpectraOptions,
  type DuctilityDemandSpectra,
  type DuctilitySpectra,
  type DuctilitySpectraOptions,
  ductilityDemandSpectra,
} from './inelastic/ductility.js';
export { describeHysteresis, type Hysteresis, parseHysteresis } from './inelastic/hysteresis.js';
export {
  cornerPeriodFromSpectrum,
  NASSAR_KRAWINKLER_LABEL,
  NEWMARK_HALL_LABEL,
  nassarKrawinklerReduction,
  newmarkHallReduction,
  type ReferenceReduction,
  type ReferenceReductions,
  referenceReductions,
} from './inelastic/r-mu-t.js';
export { type YieldingOptions, type YieldingPeak, yieldingPeak } from './inelastic/yielding.js';
export { defaultPeriodsS, logSpaced, parseDampings, parsePeriods } from './oscillator/grid.js';
export { wasmSimdSupported } from './oscillator/kernels/wasm.js';
export { hermitePeak } from './oscillator/peak.js';
export {
  METHOD_DESCRIPTIONS,
  METHODS,
  type Method,
  newmarkCoefficients,
  piecewiseExactCoefficients,
  prewarpedOscillator,
  type StepCoefficients,
  stepCoefficients,
} from './oscillator/recurrence.js';
export { substepCount } from './oscillator/substeps.js';
export { type Peaks, type SweepKernel, type SweepOptions, sweepOscillators } from './oscillator/sweep.js';
export { OutputSet, writeFileAtomic } from './output/output-set.js';
export * from './plot/index.js';
export { suiteFigure } from './plot/suite-figure.js';
export { fourierAmplitudeSpectrum, konnoOhmachiSmooth, konnoOhmachiWeight } from './record/fourier.js';
export { integrateRecord } from './record/integrate.js';
export {
  ariasIntensity,
  cumulativeAbsoluteVelocity,
  type GroundMotionMeasures,
  groundMotionMeasures,
  husidCurve,
} from './record/measures.js';
export { applyProcessingPlan, type ProcessingPlan } from './record/process.js';
export { type ReadOptions, readRecordStream, readRecordText, unitWarnings } from './record/read.js';
export {
  createRecord,
  type GroundRecord,
  type ProcessingStep,
  peakGroundAcceleration,
} from './record/record.js';
export { type SynthOptions, synthesizeRecord } from './record/synth.js';
export { assembleReport, type ReportRequest } from './report/assemble.js';
export { type ReportInput, renderReport } from './report/report.js';
export { renderSuiteReport } from './report/suite-report.js';
export { asce722MultiPeriodSpectrum, asce722TwoPeriodSpectrum } from './spectrum/asce722.js';
export { broadenByEvaluation, broadenSpectrum } from './spectrum/broaden.js';
export { compareDamping, newmarkHallFactors } from './spectrum/damping.js';
export {
  asce716Spectrum,
  type DesignSpectrum,
  designPsaG,
  ec8DampingCorrection,
  ec8Spectrum,
} from './spectrum/design.js';
export { readSpectrumTable, tableSpectrum } from './spectrum/design-table.js';
export {
  FLOOR_METHOD_DESCRIPTION,
  floorCascadeSpectrum,
  floorRecord,
  floorSpectrum,
} from './spectrum/floor.js';
export {
  type CombinedSpectrum,
  combineSpectra,
  envelopeCurve,
  type FloorSpectrumSet,
  floorSpectrumSet,
  meanCurve,
  recordLabels,
  type SpectrumSet,
} from './spectrum/floor-set.js';
export { type RotDOptions, type RotDSpectra, rotDSpectra } from './spectrum/rotd.js';
export { scaleToTarget } from './spectrum/scale.js';
export {
  assembleSpectrum,
  PARALLEL_MIN_OSCILLATOR_STEPS,
  type ParallelSpectrumOptions,
  responseSpectrum,
  responseSpectrumParallel,
  rotdThreads,
  type Spectrum,
  type SpectrumCurve,
  type SpectrumOptions,
} from './spectrum/spectrum.js';
export { fitTarget, type TargetFit, targetOverlay, targetRecord } from './spectrum/target.js';
export {
  DuctilityPool,
  ductilityDemandOnThreads,
  ductilitySpectraOnThreads,
} from './threads/ductility-pool.js';
export { type ParallelRotDOptions, RotDPool, rotDSpectraParallel } from './threads/rotd-pool.js';
export { type ParallelSweepOptions, SweepPool, sweepOscillatorsParallel } from './threads/sweep-pool.js';

/** Public API of the whole-curve fit. */
export { fitVoltammograms } from './fitVoltammograms';
export { levenbergMarquardt } from './levenbergMarquardt';
export type { FitProgress, LeastSquaresProblem, LevenbergMarquardtOptions, LevenbergMarquardtResult, StopReason } from './levenbergMarquardt';
export { linearizedCovariance } from './fitUncertainty';
export type { LinearizedCovariance, LinearizedCovarianceOptions } from './fitUncertainty';
export { PARAMETER_SPECS, DEFAULT_FREE } from './fitParameters';
export type * from './fitTypes';
export { compareFitModels, mechanismCandidates, ohmicCandidates } from './compareFitModels';
export type { CompareFitModelsOptions, EvidenceGrade, FitCandidate, ModelComparison } from './compareFitModels';
export { fitWithComparison } from './fitWithComparison';
export { perAreaFit, type PerAreaFit } from './perAreaFit';
export type { FitComparisonChoice, FitWithComparisonOptions, FitWithComparisonResult } from './fitWithComparison';

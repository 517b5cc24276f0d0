/** Public API of the baseline methods. Each returns the exact curve it subtracts. */
export { linearPrePeakBaseline } from './linearPrePeakBaseline';
export type { LinearBaselineResult, LinearPrePeakBaselineInput, LinearPrePeakBaselineOptions } from './linearPrePeakBaseline';
export { polynomialBaseline } from './polynomialBaseline';
export type { PolynomialBaselineInput, PolynomialBaselineOptions } from './polynomialBaseline';
export { twoPointBaseline } from './twoPointBaseline';
export type { TwoPointBaselineInput } from './twoPointBaseline';
export { nicholsonReturnBaseline } from './nicholsonReturnBaseline';
export type { NicholsonReturnBaselineInput, NicholsonReturnBaselineOptions, NicholsonReturnBaselineResult } from './nicholsonReturnBaseline';
export { nicholsonPeakRatio } from './nicholsonPeakRatio';
export type { NicholsonPeakRatioInput } from './nicholsonPeakRatio';
export { findPrePeakWindow } from './findPrePeakWindow';
export type { FindPrePeakWindowOptions, PrePeakWindow } from './findPrePeakWindow';
export { baselineForPeak } from './baselineForPeak';
export { decayAfterPrevious, decayAfterSwitch } from './extendedDecayBaselines';
export type { BaselineOutcome, BaselineRef, BaselineRequest } from './baselineForPeak';
export { baselineAt } from './baselineCurve';
export type { BaselineTrace } from './baselineCurve';

/** Public API of peak location and measurement. */
export { findProminentMaxima } from './findProminentMaxima';
export type { FindProminentMaximaOptions, ProminentMaximum } from './findProminentMaxima';
export { findShoulders } from './findShoulders';
export type { FindShouldersOptions, Shoulder } from './findShoulders';
export { madSecondDifferenceNoise } from './madSecondDifferenceNoise';
export type { MadSecondDifferenceNoiseOptions } from './madSecondDifferenceNoise';
export { refinePeakQuadratic } from './refinePeakQuadratic';
export type { QuadraticVertex, RefinePeakQuadraticInput, RefinePeakQuadraticOptions } from './refinePeakQuadratic';
export { locatePeaksInSweep } from './locatePeaksInSweep';
export type { LocatePeaksOptions, PeakCandidate } from './locatePeaksInSweep';
export { measurePeak } from './measurePeak';
export { buildTimeAxis, prepareSweepSignals, windowForSpan } from './sweepSignals';
export type { PrepareSweepSignalsInput, SweepSignals } from './sweepSignals';
export { seededGaussian, simulatedVoltammogram } from './simulatedVoltammogram';
export type { SimulatedVoltammogramOptions } from './simulatedVoltammogram';

/** Public API of the scan-rate series methods. */
export * from './randlesSevcik';
export * from './lavironSurfaceWave';
export * from './logLogSlope';
export * from './peakPotentialVsLogScanRate';
export * from './electroactiveAreaFromStandard';
export * from './doubleLayerCapacitance';
export * from './chargingCurrentGap';
export * from './windowMedianGap';
export * from './surfaceWaveCurrent';
export * from './classifySeriesCouple';
export type * from './seriesPoint';
export * from './combinedDiffusionInterval';
export * from './lavironIrreversibleWave';
export * from './ohmicWidening';
export * from './followUpSignature';
export * from './ohmicPeakCurrentRatio';
export * from './filmOhmicSeparation';

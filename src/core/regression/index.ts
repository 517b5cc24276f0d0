/** Public API of the regression helpers. */
export { fitLine } from './fitLine';
export type { FitLineOptions, FitLineResult } from './fitLine';
export { logGamma, regularizedIncompleteBeta, studentTCdf, studentTQuantile } from './studentTQuantile';
export * from './fitLinearModel';
export { polynomialCoefficients } from './polynomialCoefficients';

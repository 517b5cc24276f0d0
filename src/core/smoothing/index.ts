/** Public API of the smoothing methods. */
export { savitzkyGolayCoefficients, savitzkyGolayDerivative, savitzkyGolaySmooth } from './savitzkyGolaySmooth';
export type { SavitzkyGolayCoefficientOptions, SavitzkyGolayDerivativeOptions, SavitzkyGolayOptions } from './savitzkyGolaySmooth';

/** Public surface of the cyclic-voltammetry simulator. */
export { simulateCv } from './simulateCv';
export { automaticGrid, simulateCvCouples } from './simulateCvCouples';
export { simulatedVoltammogram } from './simulatedVoltammogram';
export { DEFAULT_SIMULATION } from './simulationTypes';
export type { CoupleField, CoupleInput, CvSimulationInput, CvSimulationResult, FixedGrid, SimulateCvOptions, SimulationMechanism, SimulationNumerics } from './simulationTypes';
export { solveTridiagonalThomas } from './solveTridiagonalThomas';

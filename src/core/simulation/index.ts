/** Public surface of the cyclic-voltammetry simulator. */
export { simulateCv } from './simulateCv';
export { simulatedVoltammogram } from './simulatedVoltammogram';
export { DEFAULT_SIMULATION } from './simulationTypes';
export type { CvSimulationInput, CvSimulationResult, SimulateCvOptions, SimulationMechanism } from './simulationTypes';
export { solveTridiagonalThomas } from './solveTridiagonalThomas';

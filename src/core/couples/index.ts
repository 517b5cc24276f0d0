/** Public API of couple pairing, metrics and verdicts. */
export { pairPeaksIntoCouples } from './pairPeaksIntoCouples';
export type { PairPeaksOptions, PeakPair } from './pairPeaksIntoCouples';
export { buildCouple } from './buildCouple';
export type { BuildCoupleOptions } from './buildCouple';
export { classifyCouple, VERDICT_LABELS } from './classifyCouple';
export type { ClassifyCoupleInput, ClassifyCoupleOptions } from './classifyCouple';
export { refineVerdictWithSeries } from './refineVerdictWithSeries';
export { reversibleDeltaEpAtSwitch, reversibleDeltaEpLimitV } from './reversibleDeltaEpAtSwitch';
export type { ReversibleDeltaEp, ReversibleDeltaEpAtSwitchOptions } from './reversibleDeltaEpAtSwitch';

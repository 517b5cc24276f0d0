/**
 * What the fit panel reads besides the store's state: the parameters each mechanism can free, and
 * the fit in rows of rounded text (io/fitTables.ts, the same rows the results sheet writes).
 */
import type { FitMechanism, FitParameter } from '../core/fit';
import { COUPLE_PARAMETERS } from '../core/fit/fitParameters';

export { fitParameterRows, strongestCorrelations } from '../io/fitTables';
export type { CorrelationPair, FitParameterRow } from '../io/fitTables';
export type { ComparisonSummary } from '../io/fitContract';
export type { FitComparisonChoice, FitMechanism, FitParameter, FitResult } from '../core/fit';

/** The parameters a fit of `mechanism` can free: per couple, then R_u, C_dl and a straight background per file. */
export function freeChoicesOf(mechanism: FitMechanism): FitParameter[] {
  return [...COUPLE_PARAMETERS[mechanism], 'uncompensatedOhm', 'doubleLayerFPerCm2', 'background'];
}

/**
 * Reference scales of a run: which scale each file was measured on, which scale the report uses,
 * and where the internal standard (Fc⁺/Fc) sits. Conversions go through SHE (convertPotential.ts).
 * Rules (design): a file's scale is the run's `inputReference` when given, else its own
 * metadata; converting to an output scale needs a known input scale (else UNKNOWN_REFERENCE).
 * A measured internal standard is the couple with E½ nearest `nearV` (within 0.15 V) in its file,
 * the median over files when several hold it.
 */
import { AnalysisError } from '../errors';
import { convertPotential, findReferenceElectrode, referenceVsShe, resolveReferenceId } from '../reference';
import type { ConversionContext, ReferenceId } from '../reference';
import { median } from '../statistics/median';
import type { AnalyzeRunOptions, RunInput, RunWarning } from './runTypes';
import type { VoltammogramAnalysis } from './types';

export interface RunReferencePlan {
  output: ReferenceId | null;
  inputs: Array<ReferenceId | null>;
  context: ConversionContext;
}

export function planReferences(inputs: RunInput[], options: AnalyzeRunOptions): RunReferencePlan {
  const output = options.outputReference ? resolveReferenceId(options.outputReference) : null;
  const forced = options.inputReference ? resolveReferenceId(options.inputReference) : null;
  const refs = inputs.map((f) => forced ?? (f.referenceElectrode ? (findReferenceElectrode(f.referenceElectrode)?.id ?? null) : null));
  if (output !== null) {
    refs.forEach((r, i) => {
      if (r === null) {
        const named = inputs[i]?.referenceElectrode;
        const why = named ? `its metadata names "${named}", which is not a known reference electrode` : 'neither the file nor the options say what it was measured against';
        throw new AnalysisError('UNKNOWN_REFERENCE', `${inputs[i]?.fileName}: cannot report on ${output} because ${why}; give the input scale (--from-ref)`);
      }
    });
  }
  const context: ConversionContext = {};
  if (options.pH !== undefined) context.pH = options.pH;
  if (options.temperatureK !== undefined) context.temperatureK = options.temperatureK;
  if (options.referenceOverridesVsSheV) context.overridesVsSheV = options.referenceOverridesVsSheV;
  return { output, inputs: refs, context };
}

/** Sets the internal standard in `plan.context` from a value or from first-pass analyses. */
export function settleInternalStandard(
  plan: RunReferencePlan,
  inputs: RunInput[],
  options: AnalyzeRunOptions,
  firstPass: () => VoltammogramAnalysis[],
): void {
  const src = options.internalStandard;
  if (!src) return;
  if (src.kind === 'value') {
    plan.context.internalStandard = { eHalfV: src.eHalfV, scale: resolveReferenceId(src.reference), origin: src.origin ?? 'given by the user' };
    return;
  }
  const analyses = firstPass();
  const hits: Array<{ eHalfV: number; scale: ReferenceId; fileName: string }> = [];
  inputs.forEach((f, i) => {
    const wanted = src.fileName ? f.fileName === src.fileName : (f.role ?? 'series') === 'series';
    const scale = plan.inputs[i];
    if (!wanted || !scale) return;
    const cycle = analyses[i]?.cycles[0];
    const near = (cycle?.couples ?? []).filter((c) => c.eHalfV !== null && Math.abs((c.eHalfV as number) - src.nearV) <= 0.15)
      .sort((a, b) => Math.abs((a.eHalfV as number) - src.nearV) - Math.abs((b.eHalfV as number) - src.nearV))[0];
    if (near) hits.push({ eHalfV: near.eHalfV as number, scale, fileName: f.fileName });
  });
  const first = hits[0];
  if (!first) {
    throw new AnalysisError('NO_PEAK', `no couple with E½ within 0.15 V of ${src.nearV} V found for the internal standard${src.fileName ? ` in ${src.fileName}` : ''} (its file's scale must be known)`);
  }
  if (hits.some((h) => h.scale !== first.scale)) {
    throw new AnalysisError('BAD_OPTION', 'the internal-standard files are on different reference scales');
  }
  plan.context.internalStandard = {
    eHalfV: median(hits.map((h) => h.eHalfV)), scale: first.scale, origin: `measured in ${[...new Set(hits.map((h) => h.fileName))].join(', ')}`,
  };
}

/** Constant added to a file's potentials to put them on the output scale (V). */
export function offsetFor(plan: RunReferencePlan, fileIndex: number): number {
  const from = plan.inputs[fileIndex] ?? null;
  if (plan.output === null || from === null) return 0;
  return convertPotential(0, from, plan.output, plan.context);
}

/** Plain-words basis of each scale used, and warnings for typical or disputed values. */
export function describeReferences(plan: RunReferencePlan): { basis: string[]; warnings: RunWarning[] } {
  if (plan.output === null) return { basis: ['potentials on each file\'s own reference scale (no conversion)'], warnings: [] };
  const used = new Set<ReferenceId>([plan.output, ...plan.inputs.filter((r): r is ReferenceId => r !== null)]);
  const basis: string[] = [];
  const warnings: RunWarning[] = [];
  for (const id of used) {
    const pos = referenceVsShe(id, plan.context);
    basis.push(pos.basis);
    if (pos.typical) warnings.push({ code: 'REFERENCE', message: `${id}: ${pos.basis}` });
    const entry = findReferenceElectrode(id);
    if (entry?.status === 'sources-disagree' && entry.note) warnings.push({ code: 'REFERENCE', message: `${entry.label}: ${entry.note}` });
  }
  const t = plan.context.temperatureK;
  if (t !== undefined && Math.abs(t - 298.15) > 5) {
    warnings.push({ code: 'TEMPERATURE', message: `reference offsets are 25 °C values; at ${(t - 273.15).toFixed(1)} °C they may be off by several mV` });
  }
  return { basis, warnings };
}

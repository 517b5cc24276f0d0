/**
 * Reference scales of a run: which scale each file was recorded on, the offset to the reported
 * scale, where the internal standard (Fc⁺/Fc) sits, and the plain-words basis of every scale used.
 * Conversions go through SHE (reference/referenceOffset.ts, the same function the screen uses).
 * Rules (design): a file's scale is its series' `inputReference` when given, else its own
 * metadata; reporting on another scale needs a known recording scale (else UNKNOWN_REFERENCE).
 * A measured internal standard is the couple with E½ nearest `nearV` (within 0.15 V) in its file,
 * the median over files when several hold it.
 */
import { STANDARD_TEMPERATURE_K } from '../constants';
import { AnalysisError } from '../errors';
import { findReferenceElectrode, referenceOffset, referenceTemperatureShift, resolveReferenceId } from '../reference';
import type { ConversionContext, ReferenceId } from '../reference';
import { median } from '../statistics/median';
import { kelvinToCelsius } from '../units';
import type { ResolvedRunFile } from './resolveRun';
import type { FileReference, ResolvedCell, ResolvedReport, RunFileResult, RunWarning } from './runTypes';
import type { VoltammogramAnalysis } from './types';

/** The scale a file was recorded on: its series' choice, else its metadata, else unknown. */
export function recordingScaleOf(file: ResolvedRunFile, cell: Pick<ResolvedCell, 'inputReference'>): ReferenceId | null {
  if (cell.inputReference) return cell.inputReference;
  const named = file.input.referenceElectrode;
  return named ? (findReferenceElectrode(named)?.id ?? null) : null;
}

/** The conversion context of a series: pH, temperature, user values and a given internal standard. */
export function conversionContextOf(cell: Pick<ResolvedCell, 'temperatureK' | 'pH' | 'internalStandard'>, report: Pick<ResolvedReport, 'referenceOverridesVsSheV'>): ConversionContext {
  const context: ConversionContext = { temperatureK: cell.temperatureK, overridesVsSheV: report.referenceOverridesVsSheV };
  if (cell.pH !== null) context.pH = cell.pH;
  const std = cell.internalStandard;
  if (std?.kind === 'value') context.internalStandard = { eHalfV: std.eHalfV, scale: resolveReferenceId(std.reference), origin: std.origin ?? 'given by the user' };
  return context;
}

/**
 * Recording scale → reported scale for one file or series (`what` names it in messages). With
 * `unconvertible: 'keep-recording-scale'` an impossible conversion leaves it on its own scale with
 * a note instead of failing; the screen's display scale comes from here too.
 */
export function scaleOffset(input: ReferenceId | null, report: Pick<ResolvedReport, 'outputReference' | 'unconvertible'>, context: ConversionContext, what: string, unknownWhy = 'nothing says what it was recorded against'): FileReference {
  const output = report.outputReference;
  if (output === null) return { input, output, offsetV: 0, basis: [], typical: false, note: null };
  try {
    if (input === null) throw new AnalysisError('UNKNOWN_REFERENCE', `${what}: cannot report on ${output} because ${unknownWhy}; give the scale the files were recorded on`);
    const o = referenceOffset(input, output, context);
    return { input, output, offsetV: o.offsetV, basis: o.basis, typical: o.typical, note: null };
  } catch (err) {
    if (report.unconvertible === 'error' || !(err instanceof AnalysisError)) throw err;
    const why = err.message.startsWith(`${what}: `) ? err.message.slice(what.length + 2) : err.message;
    return { input, output: null, offsetV: 0, basis: [], typical: false, note: `${what} stays on its recording scale: ${why}` };
  }
}

export function fileReference(file: ResolvedRunFile, cell: ResolvedCell, report: ResolvedReport, context: ConversionContext): FileReference {
  const named = file.input.referenceElectrode;
  const why = named ? `its metadata names "${named}", which is not a known reference electrode` : 'neither the file nor its series says what it was recorded against';
  return scaleOffset(recordingScaleOf(file, cell), report, context, file.input.fileName, why);
}

/**
 * Sets `context.internalStandard` from a measured couple: `firstPass(i)` analyses file i on its
 * recording scale. Searches the named file (any series) or else the series' own files.
 */
export function settleInternalStandard(
  context: ConversionContext,
  cell: ResolvedCell,
  files: ResolvedRunFile[],
  seriesIndices: number[],
  firstPass: (fileIndex: number) => VoltammogramAnalysis,
): void {
  const src = cell.internalStandard;
  if (src?.kind !== 'measured') return;
  const searched = src.fileName ? files.flatMap((f, i) => (f.input.fileName === src.fileName ? [i] : [])) : seriesIndices;
  const hits: Array<{ eHalfV: number; scale: ReferenceId; fileName: string }> = [];
  for (const i of searched) {
    const f = files[i] as ResolvedRunFile;
    const scale = recordingScaleOf(f, cell);
    if (!scale) continue;
    const near = (firstPass(i).cycles[0]?.couples ?? []).filter((c) => c.eHalfV !== null && Math.abs(c.eHalfV - src.nearV) <= 0.15)
      .sort((a, b) => Math.abs((a.eHalfV as number) - src.nearV) - Math.abs((b.eHalfV as number) - src.nearV))[0];
    if (near) hits.push({ eHalfV: near.eHalfV as number, scale, fileName: f.input.fileName });
  }
  const first = hits[0];
  if (!first) {
    throw new AnalysisError('NO_PEAK', `no couple with E½ within 0.15 V of ${src.nearV} V found for the internal standard${src.fileName ? ` in ${src.fileName}` : ''} (its file's recording scale must be known)`);
  }
  if (hits.some((h) => h.scale !== first.scale)) throw new AnalysisError('BAD_OPTION', 'the internal-standard files are on different reference scales');
  context.internalStandard = {
    eHalfV: median(hits.map((h) => h.eHalfV)), scale: first.scale, origin: `measured in ${[...new Set(hits.map((h) => h.fileName))].join(', ')}`,
  };
}

/** Plain-words basis of the scales a series used, and warnings for typical or disputed values. */
export function describeSeriesReferences(files: RunFileResult[], output: ReferenceId | null, temperatureK: number): { basis: string[]; warnings: RunWarning[] } {
  if (output === null) return { basis: ["potentials on each file's own recording scale (no conversion)"], warnings: [] };
  // A file kept on its recording scale contributes its note, not a basis.
  const basis = [...new Set(files.flatMap((f) => f.reference.basis))];
  const warnings: RunWarning[] = files.flatMap((f) => (f.reference.note ? [{ code: 'REFERENCE' as const, fileName: f.fileName, message: f.reference.note }] : []));
  for (const f of files.filter((x) => x.reference.typical).slice(0, 1)) warnings.push({ code: 'REFERENCE', message: `a typical, not measured, value sets the scale: ${f.reference.basis.join('; ')}` });
  const used = new Set<ReferenceId>([output, ...files.flatMap((f) => (f.reference.input ? [f.reference.input] : []))]);
  for (const id of used) {
    const entry = findReferenceElectrode(id);
    if (entry?.status === 'sources-disagree' && entry.note) warnings.push({ code: 'REFERENCE', message: `${entry.label}: ${entry.note}` });
  }
  if (Math.abs(temperatureK - STANDARD_TEMPERATURE_K) > 1) {
    const at = `${kelvinToCelsius(temperatureK).toFixed(1)} °C`;
    const without = [...used].filter((id) => !['SHE', 'RHE', 'Fc'].includes(id) && referenceTemperatureShift(id, 0, temperatureK) === null);
    const withCoefficient = [...used].filter((id) => referenceTemperatureShift(id, 0, temperatureK) !== null);
    if (without.length) warnings.push({ code: 'TEMPERATURE', message: `no published temperature coefficient for ${without.join(', ')}: the 25 °C values of the scales are used at ${at} and may be off by several mV` });
    else if (withCoefficient.length) warnings.push({ code: 'TEMPERATURE', message: `${withCoefficient.join(', ')} taken at ${at} with its published temperature dependence (see the reference basis)` });
  }
  return { basis, warnings };
}

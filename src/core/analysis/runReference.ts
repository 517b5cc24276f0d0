/**
 * Reference scales of a run: which scale each file was recorded on, the offset to the reported
 * scale, where the internal standard (Fc⁺/Fc) sits, the plain-words basis of every scale used and
 * the cautions that go with them (reference/referenceCautions.ts).
 * Conversions go through SHE (reference/referenceOffset.ts, the same function the screen uses).
 * Rules (design): a file's scale is the one entered for its series when the user entered one,
 * else the one its own metadata states, else its series' value (from another file's header, or
 * the default); each file is converted from its own scale, so a series whose files state
 * different references is converted file by file, with a warning. A file that states nothing in
 * such a series has no scale (its neighbours disagree), and reporting on another scale then needs
 * one (else UNKNOWN_REFERENCE).
 * A measured internal standard is the couple with E½ nearest `nearV` (within 0.15 V) in its file,
 * the median over files when several hold it; it is refused when it is the only couple of the
 * series' own files (every potential would read 0 V vs Fc⁺/Fc).
 */
import { STANDARD_TEMPERATURE_K } from '../constants';
import { AnalysisError } from '../errors';
import { findReferenceElectrode, nonAqueousWord, readReferenceName, referenceCautions, referenceOffset, referenceTemperatureShift, resolveReferenceId } from '../reference';
import type { ConversionContext, ReferenceId } from '../reference';
import { kelvinToCelsius } from '../units';
import type { ResolvedRunFile } from './resolveRun';
import type { FileReference, ResolvedCell, ResolvedReport, RunFileResult, RunWarning } from './runTypes';

/** What the files of one series state about their scales, and what the internal standard's search found. */
export interface SeriesReferenceFacts {
  /** Distinct known scales stated by the series' own files (role 'series'), in file order. */
  statedScales: ReferenceId[];
  /** Sentences about the internal standard (where it was found, how far from the search potential). */
  notes: string[];
}

/** The scale a file's own metadata states, or null (nothing stated, or a name not in the table). */
function statedScaleOf(file: ResolvedRunFile): ReferenceId | null {
  const named = file.input.referenceElectrode;
  return named ? (findReferenceElectrode(named)?.id ?? null) : null;
}

/** Distinct scales the series' own files state. */
export function seriesReferenceFacts(files: readonly ResolvedRunFile[], indices: readonly number[]): SeriesReferenceFacts {
  const stated = indices.flatMap((i) => {
    const f = files[i] as ResolvedRunFile;
    const id = f.role === 'series' ? statedScaleOf(f) : null;
    return id ? [id] : [];
  });
  return { statedScales: [...new Set(stated)], notes: [] };
}

const entered = (cell: Pick<ResolvedCell, 'origins'>) => (cell.origins.inputReference ?? 'entered') === 'entered';

/**
 * The scale a file was recorded on: the series' scale when the user entered it, else the file's
 * own statement, else the series' scale (a header of another file, or the default) unless the
 * series' files disagree.
 */
export function recordingScaleOf(file: ResolvedRunFile, cell: Pick<ResolvedCell, 'inputReference' | 'origins'>, facts?: Pick<SeriesReferenceFacts, 'statedScales'>): ReferenceId | null {
  if (cell.inputReference && entered(cell)) return cell.inputReference;
  if (file.input.referenceElectrode) return statedScaleOf(file);
  if ((facts?.statedScales.length ?? 0) > 1) return null;
  return cell.inputReference;
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

/** Why a file has no scale, in words, for the message that refuses a conversion. */
function unknownScaleWhy(file: ResolvedRunFile, facts: Pick<SeriesReferenceFacts, 'statedScales'>): string {
  const named = file.input.referenceElectrode;
  if (named) return `its metadata names "${named}", ${readReferenceName(named).refusal ?? 'which is not a known reference electrode'}`;
  if (facts.statedScales.length > 1) return `it states no reference and the other files of its series state different ones (${facts.statedScales.join(', ')}), so none of them can be taken for it`;
  return 'neither the file nor its series says what it was recorded against';
}

export function fileReference(file: ResolvedRunFile, cell: ResolvedCell, report: ResolvedReport, context: ConversionContext, facts: SeriesReferenceFacts = { statedScales: [], notes: [] }): FileReference {
  const input = recordingScaleOf(file, cell, facts);
  const ref = scaleOffset(input, report, context, file.input.fileName, unknownScaleWhy(file, facts));
  const cautions = [...facts.notes, ...scaleCautions(file, cell, report, context, ref)];
  return cautions.length ? { ...ref, cautions } : ref;
}

/** Between the internal standard's own scale and Fc⁺/Fc the measured E½ is the whole offset: no table value enters. */
function measuredDirectly(ref: FileReference, context: ConversionContext): boolean {
  const std = context.internalStandard?.scale;
  return std !== undefined && ((ref.input === std && ref.output === 'Fc') || (ref.input === 'Fc' && ref.output === std));
}

/** Sentences about one file's scale: assumed fillings, an entered scale against the file's own, and referenceCautions. */
function scaleCautions(file: ResolvedRunFile, cell: ResolvedCell, report: ResolvedReport, context: ConversionContext, ref: FileReference): string[] {
  const out: string[] = [];
  const named = file.input.referenceElectrode;
  const stated = statedScaleOf(file);
  const fileName = file.input.fileName;
  if (named && ref.input === stated) {
    const assumed = readReferenceName(named).assumption;
    if (assumed) out.push(`${fileName}: ${assumed}`);
  }
  if (stated && ref.input && stated !== ref.input) out.push(`${fileName} states "${named ?? ''}" (${stated}) but its series is set to ${ref.input}, which is used`);
  const metadata = Object.values(file.input.provenance?.metadata ?? {}).join(' ');
  const solvent = nonAqueousWord(`${metadata} ${named ?? ''}`);
  const fc = report.outputReference === 'Fc' || ref.input === 'Fc' ? 'potentials on the Fc⁺/Fc scale'
    : context.internalStandard !== undefined || cell.internalStandard !== null ? 'an Fc⁺/Fc internal standard' : null;
  out.push(...referenceCautions({
    used: [ref.input, ref.output, context.internalStandard?.scale ?? null].filter((x): x is ReferenceId => x !== null),
    converted: ref.output !== null && ref.input !== ref.output && !measuredDirectly(ref, context),
    nonAqueousBecause: fc ?? (solvent ? `the header names ${solvent}` : null),
  }));
  return out;
}

/** Plain-words basis of the scales a series used, and warnings for typical or disputed values. */
export function describeSeriesReferences(files: RunFileResult[], output: ReferenceId | null, temperatureK: number): { basis: string[]; warnings: RunWarning[] } {
  if (output === null) return { basis: ["potentials on each file's own recording scale (no conversion)"], warnings: [...mixedScaleWarnings(files, null), ...cautionWarnings(files)] };
  // A file kept on its recording scale contributes its note, not a basis.
  const basis = [...new Set(files.flatMap((f) => f.reference.basis))];
  const warnings: RunWarning[] = files.flatMap((f) => (f.reference.note ? [{ code: 'REFERENCE' as const, fileName: f.fileName, message: f.reference.note }] : []));
  warnings.push(...mixedScaleWarnings(files, output), ...cautionWarnings(files));
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

/** A series whose files were recorded against different references: converted file by file, or not comparable at all. */
function mixedScaleWarnings(files: RunFileResult[], output: ReferenceId | null): RunWarning[] {
  const members = files.filter((f) => f.role === 'series' && f.reference.input !== null);
  const scales = [...new Set(members.map((f) => f.reference.input as ReferenceId))];
  if (scales.length < 2) return [];
  const each = members.map((f) => `${f.fileName}: ${String(f.reference.input)}`).join('; ');
  const message = output === null
    ? `the series mixes reference electrodes (${each}) and no scale to report on was chosen: its potentials are on different scales, so E½ and peak positions across the series are not comparable; choose a scale to report on`
    : `the series mixes reference electrodes (${each}): each file was converted from its own stated scale to ${output}`;
  return [{ code: 'REFERENCE', message }];
}

/** Every file's cautions, each sentence once. */
function cautionWarnings(files: RunFileResult[]): RunWarning[] {
  return [...new Set(files.flatMap((f) => f.reference.cautions ?? []))].map((message) => ({ code: 'REFERENCE' as const, message }));
}

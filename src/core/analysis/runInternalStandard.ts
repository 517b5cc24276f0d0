/**
 * The measured internal standard (Fc⁺/Fc) of a series: the couple with E½ nearest the search
 * potential (within 0.15 V) in the named companion file, or else in the series' own files, each
 * file on its own recording scale (runReference.ts recordingScaleOf); the median over files when
 * several hold it, every E½ first moved onto the first file's scale through SHE.
 * Refused when the chosen couple is the only couple of the series' own files: it would then be the
 * analyte itself, and every potential would read 0 V vs Fc⁺/Fc. The notes say where the standard
 * was found, how far from the search potential, and when its file's scale differs from the series'.
 * Source of the practice: IUPAC recommendation of ferrocene as internal reference, G. Gritzner,
 *   J. Kůta, Pure Appl. Chem. 56 (1984) 461 (from memory). The 0.15 V search window and the 50 mV
 *   distance that draws a caution are common practice, no source.
 */
import { AnalysisError } from '../errors';
import { referenceOffset, type ConversionContext, type ReferenceId } from '../reference';
import { median } from '../statistics/median';
import type { ResolvedRunFile } from './resolveRun';
import { recordingScaleOf, type SeriesReferenceFacts } from './runReference';
import type { ResolvedCell } from './runTypes';
import type { VoltammogramAnalysis } from './types';

const SEARCH_WINDOW_V = 0.15;
const FAR_V = 0.05;

interface Hit { eHalfV: number; scale: ReferenceId; fileName: string; coupleCount: number }

const mv = (v: number) => `${(v * 1000).toFixed(1)} mV`;

/** The files searched: the named one (its name as read, or not among the files: refused), else the series' own. */
function searchedFiles(files: ResolvedRunFile[], seriesIndices: number[], fileName: string | undefined): number[] {
  if (fileName === undefined) return seriesIndices;
  const named = files.flatMap((f, i) => (f.input.fileName === fileName ? [i] : []));
  if (!named.length) throw new AnalysisError('BAD_OPTION', `the internal-standard file "${fileName}" is not among the files of the run; give it with the files to analyse`);
  return named;
}

/**
 * Sets `context.internalStandard` from a measured couple: `firstPass(i)` analyses file i on its
 * recording scale. Adds its notes to `facts.notes`.
 */
export function settleInternalStandard(
  context: ConversionContext,
  cell: ResolvedCell,
  files: ResolvedRunFile[],
  seriesIndices: number[],
  firstPass: (fileIndex: number) => VoltammogramAnalysis,
  facts: SeriesReferenceFacts = { statedScales: [], notes: [] },
): void {
  const src = cell.internalStandard;
  if (src?.kind !== 'measured') return;
  const hits: Hit[] = [];
  const seen: string[] = [];
  for (const i of searchedFiles(files, seriesIndices, src.fileName)) {
    const f = files[i] as ResolvedRunFile;
    const scale = recordingScaleOf(f, cell, facts);
    if (!scale) {
      if (src.fileName !== undefined) throw new AnalysisError('UNKNOWN_REFERENCE', `the internal-standard file ${f.input.fileName} does not state a known reference electrode${f.input.referenceElectrode ? ` ("${f.input.referenceElectrode}")` : ''}; give the scale it was recorded on`);
      continue;
    }
    const couples = (firstPass(i).cycles[0]?.couples ?? []).filter((c) => c.eHalfV !== null);
    seen.push(...couples.map((c) => `${(c.eHalfV as number).toFixed(3)} V in ${f.input.fileName}`));
    const near = couples.filter((c) => Math.abs((c.eHalfV as number) - src.nearV) <= SEARCH_WINDOW_V)
      .sort((a, b) => Math.abs((a.eHalfV as number) - src.nearV) - Math.abs((b.eHalfV as number) - src.nearV))[0];
    if (near) hits.push({ eHalfV: near.eHalfV as number, scale, fileName: f.input.fileName, coupleCount: couples.length });
  }
  const first = hits[0];
  if (!first) {
    const where = src.fileName ? ` in ${src.fileName}` : " in the series' files";
    throw new AnalysisError('NO_PEAK', `no couple with E½ within ${SEARCH_WINDOW_V} V of ${src.nearV} V found for the internal standard${where} (couples found: ${seen.length ? seen.join(', ') : 'none'})`);
  }
  if (src.fileName === undefined && hits.every((h) => h.coupleCount === 1)) {
    throw new AnalysisError('BAD_OPTION', `the couple taken as the internal standard (E½ ${first.eHalfV.toFixed(4)} V, ${mv(Math.abs(first.eHalfV - src.nearV))} from the ${src.nearV} V searched) is the only couple in the series' files: it would be the analyte itself, and every potential would read 0 V vs Fc⁺/Fc. Add ferrocene to the solution, measure it in a companion file, or give its E½`);
  }
  const { internalStandard: _none, ...plain } = context;
  const onFirst = hits.map((h) => h.eHalfV + (h.scale === first.scale ? 0 : referenceOffset(h.scale, first.scale, plain).offsetV));
  const eHalfV = median(onFirst);
  const names = [...new Set(hits.map((h) => h.fileName))].join(', ');
  context.internalStandard = { eHalfV, scale: first.scale, origin: `measured in ${names}` };
  const distance = Math.abs(eHalfV - src.nearV);
  facts.notes.push(`Fc⁺/Fc: the couple at E½ = ${eHalfV.toFixed(4)} V vs ${first.scale} in ${names}, ${mv(distance)} from the ${src.nearV} V searched${distance > FAR_V ? ' — far from it: check that this couple is ferrocene' : ''}`);
  const scales = [...new Set(hits.map((h) => h.scale))];
  if (scales.length > 1) facts.notes.push(`the internal-standard files state different references (${scales.join(', ')}): each E½ was moved onto ${first.scale} through SHE before the median`);
  const seriesScales = [...new Set(seriesIndices.flatMap((i) => {
    const f = files[i] as ResolvedRunFile;
    const s = f.role === 'series' ? recordingScaleOf(f, cell, facts) : null;
    return s ? [s] : [];
  }))];
  const other = seriesScales.filter((s) => s !== first.scale);
  if (other.length) facts.notes.push(`the internal standard was recorded vs ${first.scale}, the series' files vs ${other.join(', ')}: its E½ reaches their scale through the table values of both electrodes (their liquid junctions are not included)`);
}

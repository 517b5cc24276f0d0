/**
 * What the printable notebook report of one series holds, gathered from the store in one pure
 * function: the software and its version, the method's published sources (the results sheet's own
 * list, core/analysis/runMethods.ts), the parameters, the series' cell, every file with its size,
 * SHA-256 and layout, the results table across files, and each derived number's explanation.
 */
import { RUN_METHODS } from '../core/analysis/runMethods';
import { describeLayout } from '../io/describeLayout';
import { SOFTWARE } from '../version';
import { explainCouple, type Explanation } from './explain';
import { resultsRows, type ResultsRow } from './resultsTable';
import { resolveCell, type CellOrigin } from '../run/seriesCell';
import type { HalfwaveState, RunSeriesResult } from './types';

export interface ReportModel {
  group: string;
  software: { name: string; version: string };
  methods: string[];
  parameters: [string, string][];
  cell: [string, string][];
  files: { name: string; sizeBytes: number; sha256: string | null; layout: string; scanRateVPerS: number | null }[];
  rows: ResultsRow[];
  series: RunSeriesResult | null;
  explanations: Explanation[];
}

const ORIGIN_WORDS: Record<CellOrigin, string> = { entered: 'entered', header: 'from a file header', folder: 'from the folder', default: 'default' };

export function reportModel(s: HalfwaveState, group: string): ReportModel {
  const st = s.settings;
  const c = resolveCell(s, group);
  const series = s.series[group]?.result ?? null;
  const ids = s.fileOrder.filter((id) => s.files[id]?.group === group && s.files[id]?.measurement);
  return {
    group, software: { ...SOFTWARE }, methods: RUN_METHODS,
    parameters: [
      ['smoothing', st.smoothing === 'off' ? 'off' : `Savitzky–Golay, ${st.smoothing.window} points, order ${st.smoothing.order}`],
      ['forward-peak baseline', st.forwardBaseline], ['return-peak baseline', st.returnBaseline],
      ['peak threshold', `${st.minSignalToNoise} × noise σ`], ['isolated bad points', st.spikeFilter === 'hampel' ? 'left out (Hampel test)' : 'kept'],
      ['ψ from ΔEp', st.psiMethod === 'table' ? 'Nicholson 1965 table, interpolated' : 'Lavagnini et al. 2004 closed form'],
      ['potential scale', st.reference.displayReference], ['current sign', s.convention],
    ],
    cell: ([
      ['electronCount', 'n', String(c.cell.electronCount)], ['areaCm2', 'A', `${c.cell.areaCm2} cm²`], ['concentrationMM', 'C', `${c.cell.concentrationMM} mM`],
      ['temperatureC', 'T', `${c.cell.temperatureC} °C`], ['alpha', 'αc', c.cell.alpha === null ? 'from the data' : String(c.cell.alpha)],
      ['transferElectronCount', 'nₐ', String(c.cell.transferElectronCount)],
      ['formalPotentialV', 'E°′ known', c.cell.formalPotentialV === null ? 'not known' : `${c.cell.formalPotentialV} V vs ${c.cell.fileReference}`],
      ['areaUncertaintyPercent', 'u(A)', `${c.cell.areaUncertaintyPercent} %`], ['concentrationUncertaintyPercent', 'u(C)', `${c.cell.concentrationUncertaintyPercent} %`],
      ['resistanceOhm', 'Ru', `${c.cell.resistanceOhm} Ω`], ['fileReference', 'recorded vs', c.cell.fileReference],
      ['blankFiles', 'blanks', c.cell.blankFiles.length ? c.cell.blankFiles.join(', ') : 'none'],
    ] as const).map(([field, label, v]) => [`${label} (${ORIGIN_WORDS[c.origin[field]]})`, v]),
    files: ids.map((id) => {
      const f = s.files[id];
      const m = f?.measurement;
      return { name: f?.fileName ?? id, sizeBytes: f?.sizeBytes ?? 0, sha256: f?.sha256 ?? null, layout: m ? describeLayout(m) : '—', scanRateVPerS: m?.scanRateVPerS ?? null };
    }),
    rows: resultsRows(s, group),
    series,
    explanations: series ? series.analysis.couples.flatMap((k) => Object.values(explainCouple(series, k))) : [],
  };
}

/**
 * Four text layouts of our own design, so that the importer meets different separators, decimal
 * marks, units, preambles, encodings and line ends:
 *  - commaHeader: comma-separated, header `Potential/V,Current/A,Time/s`, LF;
 *  - semicolonPreamble: free-text preamble with `scan rate = … mV/s`, semicolons, decimal comma,
 *    current in µA, LF;
 *  - tabMilliBom: UTF-8 with byte-order mark, CRLF, tab-separated, time s, potential mV, current µA;
 *  - spaceCycleNoHeader: aligned whitespace columns `cycle potential/V current/A`, no header
 *    (the scan rate is only in the file name).
 */
import type { DemoSeries, Layout } from './scenario';

export interface DemoTrace {
  timeS: Float64Array;
  potentialV: Float64Array;
  currentA: Float64Array;
  cycle: Int32Array;
}

export interface FileContext {
  series: DemoSeries;
  scanRateVPerS: number;
  run: number;
  recordedAt: string;
}

const comma = (x: string) => x.replace('.', ',');

function commaHeader(t: DemoTrace): string {
  const lines = ['Potential/V,Current/A,Time/s'];
  for (let i = 0; i < t.timeS.length; i++) {
    lines.push(`${(t.potentialV[i] as number).toFixed(4)},${(t.currentA[i] as number).toExponential(5)},${(t.timeS[i] as number).toFixed(5)}`);
  }
  return `${lines.join('\n')}\n`;
}

function semicolonPreamble(t: DemoTrace, c: FileContext): string {
  const s = c.series;
  const lines = [
    'Halfwave demo export (simulated data, see README.md)',
    'Lab: Okafor electroanalysis group, Northfield Institute of Applied Chemistry (fictional)',
    'Operator: T. Wieland',
    `Recorded: ${c.recordedAt}`,
    `Sample: ${s.sample}`,
    `Working electrode: ${s.electrode}`,
    'Reference electrode: Ag/AgCl (3 M KCl)',
    'Counter electrode: Pt wire',
    `Technique: cyclic voltammetry, ${s.truth.cycles ?? 1} cycles, run ${c.run}`,
    `scan rate = ${comma(String(Math.round(c.scanRateVPerS * 1e4) / 10))} mV/s`,
    `Step = ${comma(String((s.truth.stepV ?? 0.001) * 1000))} mV`,
    'Temperature = 25 °C',
    '',
    'E / V;I / µA',
  ];
  for (let i = 0; i < t.timeS.length; i++) {
    lines.push(`${comma((t.potentialV[i] as number).toFixed(4))};${comma(((t.currentA[i] as number) * 1e6).toFixed(5))}`);
  }
  return `${lines.join('\n')}\n`;
}

function tabMilliBom(t: DemoTrace): string {
  const lines = ['Time (s)\tPotential (mV)\tCurrent (µA)'];
  for (let i = 0; i < t.timeS.length; i++) {
    lines.push(`${(t.timeS[i] as number).toFixed(4)}\t${((t.potentialV[i] as number) * 1000).toFixed(1)}\t${((t.currentA[i] as number) * 1e6).toFixed(5)}`);
  }
  return `\uFEFF${lines.join('\r\n')}\r\n`;
}

function spaceCycleNoHeader(t: DemoTrace): string {
  const lines: string[] = [];
  for (let i = 0; i < t.timeS.length; i++) {
    lines.push(`${String(t.cycle[i]).padStart(3)}  ${(t.potentialV[i] as number).toFixed(4).padStart(8)}  ${(t.currentA[i] as number).toExponential(4).padStart(12)}`);
  }
  return `${lines.join('\n')}\n`;
}

export function formatTrace(layout: Layout, trace: DemoTrace, context: FileContext): string {
  switch (layout) {
    case 'commaHeader':
      return commaHeader(trace);
    case 'semicolonPreamble':
      return semicolonPreamble(trace, context);
    case 'tabMilliBom':
      return tabMilliBom(trace);
    case 'spaceCycleNoHeader':
      return spaceCycleNoHeader(trace);
  }
}

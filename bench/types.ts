/** One measured figure of a benchmark. Ratios are figures too (unit '×' or a named ratio). */
export interface BenchRow {
  name: string;
  value: number;
  unit: string;
  note?: string;
  /**
   * Name of the figure in `npm run bench -- --json` (e.g. 'importVsPapaparse'); rows without a
   * key are printed in the table only. A key appears once across all benches.
   */
  key?: string;
}

/** A registered bench: the file in bench/ and the async function it exports. */
export interface BenchEntry {
  title: string;
  /** Path relative to bench/, e.g. './simulationBench.ts'. */
  file: string;
  exportName: string;
}

/** One measured figure of a benchmark. Ratios are figures too (unit '×' or a named ratio). */
export interface BenchRow {
  name: string;
  value: number;
  unit: string;
  note?: string;
  /** Machine-readable name of a headline figure (e.g. 'fitMs'), for tools that read the bench. */
  key?: string;
}

/** A registered bench: the file in bench/ and the async function it exports. */
export interface BenchEntry {
  title: string;
  /** Path relative to bench/, e.g. './simulationBench.ts'. */
  file: string;
  exportName: string;
}

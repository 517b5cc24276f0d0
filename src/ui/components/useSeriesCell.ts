/** The resolved cell of a series and its display scale (recording scale → global display scale). */
import { useMemo } from 'react';
import { displayScale, runScaleKey, scaleFromRunKey, type DisplayScale } from '../../state/display';
import { useHalfwave } from '../../state/react';
import { selectSeriesCell } from '../../run/seriesCell';
import type { ResolvedCell } from '../../state/types';

export function useSeriesCell(group: string | null): ResolvedCell {
  return useHalfwave((s) => selectSeriesCell(s, group));
}

export function useSeriesScale(group: string | null): DisplayScale {
  const settings = useHalfwave((s) => s.settings);
  const { cell } = useSeriesCell(group);
  const { fileReference, pH, ferroceneHalfWaveV, temperatureC, internalStandardNearV, internalStandardFile } = cell;
  // What the analysed files carry wins (it knows a ferrocene E½ measured in a file); before any
  // file is analysed, the same conversion computed here.
  const fromRun = useHalfwave((s) => runScaleKey(s, group));
  // Keyed on what the conversion reads: a new file in the series must not give the plots a new
  // scale object (that would redraw the trace on every import tick).
  return useMemo(() => (fromRun ? scaleFromRunKey(fromRun, cell) : displayScale(settings, cell)),
    [fromRun, settings, fileReference, pH, ferroceneHalfWaveV, temperatureC, internalStandardNearV, internalStandardFile]);
}

/** True when every couple the series followed is surface-confined (the concentration is then unused). */
export function useAdsorbedSeries(group: string | null): boolean {
  return useHalfwave((s) => {
    const couples = group ? s.series[group]?.result?.analysis.couples : undefined;
    return !!couples && couples.length > 0 && couples.every((c) => c.regime === 'surface');
  });
}

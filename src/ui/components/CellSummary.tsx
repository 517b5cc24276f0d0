/** One line under the Series view's toolbar: the cell values this series' numbers were computed with. */
import { referenceChoices } from '../../state/display';
import { DASH } from '../format';
import { useAdsorbedSeries, useSeriesCell } from './useSeriesCell';

export function CellSummary({ group }: { group: string }) {
  const { cell: c } = useSeriesCell(group);
  const adsorbed = useAdsorbedSeries(group);
  const reference = referenceChoices.find((r) => r.id === c.fileReference)?.label ?? c.fileReference;
  const parts = [
    `n = ${c.electronCount}`,
    `A = ${c.areaCm2} cm²`,
    adsorbed ? 'C not used (adsorbed film)' : `C = ${c.concentrationMM} mM`,
    `T = ${c.temperatureC} °C`,
    `α = ${c.alpha ?? 'from the data'}`,
    `Ru = ${c.resistanceOhm > 0 ? `${c.resistanceOhm} Ω` : DASH}`,
    `recorded vs ${reference}`,
  ];
  return <p className="hint cell-summary" data-testid="series-cell">Cell of this series (edit in the Cell panel): {parts.join(' · ')}</p>;
}

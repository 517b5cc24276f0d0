/**
 * Derived display values the UI needs but must not compute itself: the offset between a
 * series' reference scale and the (global) display scale, the potential axis title, and the list of
 * reference electrodes for the pickers.
 */
import { convertPotential, REFERENCE_ELECTRODES, type ConversionContext, type ReferenceId } from '../core/reference';
import type { SeriesCell } from './seriesCell';
import { celsiusToKelvin, type AnalysisSettings } from './settings';

export interface ReferenceChoice {
  id: ReferenceId;
  label: string;
  note: string | null;
}

export const referenceChoices: ReferenceChoice[] = REFERENCE_ELECTRODES.map((r) => ({ id: r.id, label: r.label, note: r.note }));

/** Conversion context of a series: its pH, temperature and measured ferrocene E½. */
export function conversionContext(ref: SeriesCell): ConversionContext {
  const ctx: ConversionContext = { pH: ref.pH, temperatureK: celsiusToKelvin(ref.temperatureC) };
  if (ref.ferroceneHalfWaveV !== null && ref.fileReference !== 'Fc') {
    ctx.internalStandard = { eHalfV: ref.ferroceneHalfWaveV, scale: ref.fileReference, origin: 'entered by the user' };
  }
  return ctx;
}

export interface DisplayScale {
  /** Add to a potential on the files' scale to get it on the display scale (V). */
  offsetV: number;
  /** Short name of the display scale, e.g. "SCE". */
  name: string;
  /** Why the offset is what it is, or the reason it could not be applied. */
  basis: string;
  ok: boolean;
}

/** From a series' recording scale (its cell) to the global display scale. */
export function displayScale(settings: AnalysisSettings, cell: SeriesCell): DisplayScale {
  const { fileReference } = cell;
  const { displayReference } = settings.reference;
  const name = displayReference === 'Fc' ? 'Fc⁺/Fc' : shortName(displayReference);
  try {
    const offsetV = convertPotential(0, fileReference, displayReference, conversionContext(cell));
    return { offsetV, name, basis: `${shortName(fileReference)} → ${name}: ${offsetV >= 0 ? '+' : ''}${offsetV.toFixed(4)} V`, ok: true };
  } catch (err) {
    return { offsetV: 0, name: shortName(fileReference), basis: `cannot convert: ${(err as Error).message}; showing the files' own scale`, ok: false };
  }
}

function shortName(id: ReferenceId): string {
  return (REFERENCE_ELECTRODES.find((r) => r.id === id)?.label ?? id).replace(/\s*\(.*\)$/, '');
}

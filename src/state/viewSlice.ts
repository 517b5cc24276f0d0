/** What is on screen: selected file and cycle, current sign convention, overlays, drag mode, tables. */
import type { SliceCreator, ViewSlice } from './types';

export const createViewSlice: SliceCreator<ViewSlice> = (set, get) => ({
  selectedFileId: null,
  selectedCycle: 1,
  convention: 'iupac',
  showSmoothed: false,
  showBaselines: true,
  showTheory: false,
  showCompanions: false,
  dragMode: 'zoom',
  windowDirection: 'anodic',
  mainView: 'trace',
  safetyOpen: false,
  notice: null,
  notKept: [],
  readoutTab: 'couples',
  resultsScope: 'series',
  resultsSort: null,
  seriesOverlay: { normalisation: 'current', cycle: 1 },
  setView(patch) {
    set(patch);
  },
  setConvention(convention) {
    if (get().convention === convention) return Promise.resolve();
    get().record();
    // The analysis is in the IUPAC convention whatever is shown; only the display and exports change.
    set({ convention });
    return Promise.resolve();
  },
  selectFile(id, cycle = 1) {
    // The chosen file's series becomes the one the Series view and the Cell panel are about.
    const group = id ? get().files[id]?.group : undefined;
    set({ selectedFileId: id, selectedCycle: cycle, ...(group ? { selectedGroup: group } : {}) });
  },
  openSeries(group) {
    const s = get();
    const first = s.fileOrder.find((id) => s.files[id]?.group === group && s.files[id]?.measurement) ?? null;
    if (first) get().selectFile(first);
    set({ selectedGroup: group, readoutTab: 'files', resultsScope: 'series', resultsSort: null, mainView: 'trace' });
  },
});

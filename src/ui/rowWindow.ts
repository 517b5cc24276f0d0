/**
 * Which rows of a long table to put in the page: those in view plus a margin on each side. The
 * rows outside are stood in for by two empty rows of the same total height, so the scroll bar
 * reads as for the whole table while the page lays out and paints a few dozen rows, not thousands.
 */

/** Tables with at most this many rows are shown whole (no scrolling jumps, find-in-page sees all). */
export const WINDOW_FROM_ROWS = 60;
/** Rows kept beyond each edge of the view, so keyboard focus and quick scrolling find them drawn. */
export const WINDOW_MARGIN_ROWS = 12;

export interface RowWindow {
  /** First row drawn (0-based). */
  start: number;
  /** One past the last row drawn. */
  end: number;
}

export interface RowView {
  /** Rows in the table. */
  count: number;
  /** Height of one row (px); rows are kept to one line. */
  rowHeight: number;
  /** Top of the view minus the top of the first row (px); negative while the table starts below the view's top. */
  viewTop: number;
  /** Height of the view (px). */
  viewHeight: number;
  margin?: number;
}

/** The rows to draw for a view; every row when the table is short or the measures are unusable. */
export function rowWindow({ count, rowHeight, viewTop, viewHeight, margin = WINDOW_MARGIN_ROWS }: RowView): RowWindow {
  if (count <= WINDOW_FROM_ROWS || !(rowHeight > 0) || !Number.isFinite(viewTop) || !(viewHeight >= 0)) return { start: 0, end: count };
  const first = Math.floor(viewTop / rowHeight) - margin;
  const last = Math.ceil((viewTop + viewHeight) / rowHeight) + margin;
  const start = Math.min(count, Math.max(0, first));
  return { start, end: Math.min(count, Math.max(start, last)) };
}

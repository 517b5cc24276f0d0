// The window arithmetic of long tables (common practice, no source: list virtualisation).
import { describe, expect, it } from 'vitest';
import { rowWindow, WINDOW_FROM_ROWS, WINDOW_MARGIN_ROWS } from './rowWindow';

describe('rowWindow', () => {
  const view = { count: 1000, rowHeight: 20, viewTop: 0, viewHeight: 200 };

  it('draws every row of a short table', () => {
    expect(rowWindow({ ...view, count: WINDOW_FROM_ROWS })).toEqual({ start: 0, end: WINDOW_FROM_ROWS });
  });

  it('draws the rows in view and a margin on each side', () => {
    expect(rowWindow(view)).toEqual({ start: 0, end: 10 + WINDOW_MARGIN_ROWS });
    expect(rowWindow({ ...view, viewTop: 2000 })).toEqual({ start: 100 - WINDOW_MARGIN_ROWS, end: 110 + WINDOW_MARGIN_ROWS });
    // A row cut by the view's edge counts as in view.
    expect(rowWindow({ ...view, viewTop: 2010, margin: 0 })).toEqual({ start: 100, end: 111 });
  });

  it('stays inside the table at both ends and while the table starts below the view', () => {
    expect(rowWindow({ ...view, viewTop: 19_900 })).toEqual({ start: 995 - WINDOW_MARGIN_ROWS, end: 1000 });
    expect(rowWindow({ ...view, viewTop: 50_000 })).toEqual({ start: 1000, end: 1000 });
    expect(rowWindow({ ...view, viewTop: -150 })).toEqual({ start: 0, end: 3 + WINDOW_MARGIN_ROWS });
  });

  it('draws everything when it cannot measure', () => {
    expect(rowWindow({ ...view, rowHeight: 0 })).toEqual({ start: 0, end: 1000 });
    expect(rowWindow({ ...view, viewTop: Number.NaN })).toEqual({ start: 0, end: 1000 });
  });
});

/**
 * Draws only the rows of a long table that are in view (rowWindow.ts): the table's scrolling
 * container is watched for scrolling and resizing, the table for rows coming in, and the window
 * is recomputed from the last measures at each render, so rows arriving during a batch never
 * cost an extra render or a forced layout; measures are taken after the browser's own layout.
 */
import { useLayoutEffect, useRef, useState, type RefObject } from 'react';
import { rowWindow, WINDOW_FROM_ROWS, type RowWindow } from '../rowWindow';

interface Measures {
  rowHeight: number;
  viewTop: number;
  viewHeight: number;
}

const UNMEASURED: Measures = { rowHeight: 0, viewTop: 0, viewHeight: 0 };
/** Rows drawn until the first measure (a screenful and more), from the top, where a table opens. */
const UNMEASURED_ROWS = 40;

function scrollParent(el: HTMLElement): HTMLElement | null {
  for (let p = el.parentElement; p; p = p.parentElement) {
    const y = getComputedStyle(p).overflowY;
    if (y === 'auto' || y === 'scroll') return p;
  }
  return null;
}

const same = (a: Measures, b: Measures) => a.rowHeight === b.rowHeight && a.viewTop === b.viewTop && a.viewHeight === b.viewHeight;

/**
 * `bodyRef` goes on the table's `<tbody>`, whose drawn rows carry `data-row`; the returned window
 * says which rows to draw, with `rowHeight` for the two stand-in rows around them.
 */
export function useRowWindow(count: number): RowWindow & { rowHeight: number; bodyRef: RefObject<HTMLTableSectionElement | null> } {
  const bodyRef = useRef<HTMLTableSectionElement>(null);
  const [measures, setMeasures] = useState<Measures>(UNMEASURED);
  const long = count > WINDOW_FROM_ROWS;

  // Measured from the first row on, not only once the table is long: when a reading's last rows
  // arrive all at once (the table is held while files are read), the window comes from measures
  // already taken, with no measuring in the commit (which forced a layout of the whole page,
  // 20 ms at the end of a 120-file reading) and no second render.
  const shown = count > 0;
  useLayoutEffect(() => {
    const body = bodyRef.current;
    if (!shown || !body) return;
    // The scrolling container is looked for at the first measure, once laid out.
    let scroller: HTMLElement | null | undefined;
    let target: HTMLElement | Window | null = null;
    let frame = 0;
    const later = () => {
      frame ||= requestAnimationFrame(measure);
    };
    const measure = () => {
      frame = 0;
      if (scroller === undefined) {
        scroller = scrollParent(body);
        target = scroller ?? window;
        target.addEventListener('scroll', later, { passive: true });
        if (scroller) resized?.observe(scroller);
      }
      const row = body.querySelector<HTMLElement>('tr[data-row]');
      const top = body.getBoundingClientRect().top;
      const view = scroller ? { top: scroller.getBoundingClientRect().top, height: scroller.clientHeight } : { top: 0, height: window.innerHeight };
      const next = { rowHeight: row?.getBoundingClientRect().height ?? 0, viewTop: view.top - top, viewHeight: view.height };
      setMeasures((m) => (same(m, next) ? m : next));
    };
    // Resize reports come after the browser's own layout, so measuring in them forces none; the
    // observer reports the table's size once when it starts watching.
    const resized = typeof ResizeObserver === 'function' ? new ResizeObserver(measure) : null;
    if (resized && body.parentElement) resized.observe(body.parentElement);
    else measure();
    return () => {
      target?.removeEventListener('scroll', later);
      resized?.disconnect();
      if (frame) cancelAnimationFrame(frame);
    };
  }, [shown]);

  const win = !long ? { start: 0, end: count } : measures.rowHeight > 0 ? rowWindow({ count, ...measures }) : { start: 0, end: Math.min(count, UNMEASURED_ROWS) };
  return { ...win, rowHeight: measures.rowHeight, bodyRef };
}

/**
 * Draws only the rows of a long table that are in view (rowWindow.ts): the table's scrolling
 * container is watched for scrolling and resizing, the table for rows coming in, and the window
 * is recomputed from the last measures at each render, so rows arriving during a batch never
 * cost an extra render or a forced layout.
 */
import { useLayoutEffect, useRef, useState, type RefObject } from 'react';
import { rowWindow, WINDOW_FROM_ROWS, type RowWindow } from '../rowWindow';

interface Measures {
  rowHeight: number;
  viewTop: number;
  viewHeight: number;
}

const UNMEASURED: Measures = { rowHeight: 0, viewTop: 0, viewHeight: 0 };

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

  useLayoutEffect(() => {
    const body = bodyRef.current;
    if (!long || !body) return;
    const scroller = scrollParent(body);
    let frame = 0;
    const measure = () => {
      frame = 0;
      const row = body.querySelector<HTMLElement>('tr[data-row]');
      const top = body.getBoundingClientRect().top;
      const view = scroller ? { top: scroller.getBoundingClientRect().top, height: scroller.clientHeight } : { top: 0, height: window.innerHeight };
      const next = { rowHeight: row?.getBoundingClientRect().height ?? 0, viewTop: view.top - top, viewHeight: view.height };
      setMeasures((m) => (same(m, next) ? m : next));
    };
    const later = () => {
      frame ||= requestAnimationFrame(measure);
    };
    measure();
    const target: HTMLElement | Window = scroller ?? window;
    target.addEventListener('scroll', later, { passive: true });
    // Resize callbacks come after layout: measuring there forces none.
    const resized = typeof ResizeObserver === 'function' ? new ResizeObserver(measure) : null;
    if (scroller) resized?.observe(scroller);
    if (body.parentElement) resized?.observe(body.parentElement);
    return () => {
      target.removeEventListener('scroll', later);
      resized?.disconnect();
      if (frame) cancelAnimationFrame(frame);
    };
  }, [long]);

  const win = !long ? { start: 0, end: count } : measures.rowHeight > 0 ? rowWindow({ count, ...measures }) : { start: 0, end: Math.min(count, WINDOW_FROM_ROWS) };
  return { ...win, rowHeight: measures.rowHeight, bodyRef };
}

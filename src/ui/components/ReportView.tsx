/**
 * "Report": one printable page for a lab notebook about the series on screen: its figures (SVG
 * made in this page), the results table across files, each derived number with its formula,
 * published source and inputs, the methods used, the parameters and cell values, the software
 * version and every file's SHA-256. A print stylesheet leaves only this page, so the browser's
 * print dialog can save it as PDF.
 */
import { useEffect, useState } from 'react';
import { fitParameterRows } from '../../state/fitView';
import { useHalfwave } from '../../state/react';
import { reportModel } from '../../state/report';
import { figureImageUrl } from '../figureExport';
import { bytes, fixed, scanRate, sci, valueWithInterval } from '../format';
import { buildSeriesFigures } from '../plots/seriesFigures';
import { useSeriesScale } from './useSeriesCell';

export function ReportView() {
  const group = useHalfwave((s) => s.currentGroup());
  // The whole state: the report shows a little of everything, and is open only while it is read.
  const state = useHalfwave((s) => s);
  const model = group ? reportModel(state, group) : null;
  const scale = useSeriesScale(group);
  const figures = useReportFigures(model?.series?.analysis.couples[0] ?? null, scale.name);
  if (!group || !model) return <section className="panel report"><p className="empty">Load a series to make its report.</p></section>;
  return (
    <section className="panel report" aria-labelledby="report-title" data-testid="report-view">
      <div className="report-actions">
        <button type="button" data-testid="report-print" onClick={() => window.print()}>Print or save as PDF…</button>
      </div>
      <h2 id="report-title">Notebook report: series “{group}”</h2>
      <p>{model.software.name} {model.software.version} · {new Date().toISOString().slice(0, 16).replace('T', ' ')} UTC · potentials vs {scale.name}</p>
      <h3>Figures</h3>
      <div className="report-figures">
        {figures.map((f) => <figure key={f.caption}><img src={f.url} alt={f.caption} /><figcaption>{f.caption}</figcaption></figure>)}
        {figures.length === 0 ? <p className="hint">The figures appear once the series is fitted.</p> : null}
      </div>
      <h3>Results across files</h3>
      <table className="data" data-testid="report-results">
        <thead><tr><th scope="col">File</th><th scope="col">v / (V s⁻¹)</th><th scope="col">Cycle</th><th scope="col">E½ / V</th><th scope="col">ΔEp / mV</th><th scope="col">ipa / µA</th><th scope="col">ipc / µA</th><th scope="col">Reading</th></tr></thead>
        <tbody>{model.rows.map((r) => (
          <tr key={`${r.fileId}-${r.cycle}-${r.couple}`}><th scope="row">{r.fileName}</th><td>{scanRate(r.scanRateVPerS)}</td><td>{r.cycle}</td><td>{fixed(r.eHalfV, 4)}</td>
            <td>{fixed(r.deltaEpV, 1, 1000)}</td><td>{fixed(r.ipaA, 3, 1e6)}</td><td>{fixed(r.ipcA, 3, 1e6)}</td><td className="wrap">{r.readingText}</td></tr>
        ))}</tbody>
      </table>
      <h3>Derived numbers, formulas and sources</h3>
      {model.series?.analysis.couples.map((c) => (
        <p key={c.index}>Couple {c.index + 1}: {c.diffusion ? diffusionText(c.diffusion) : ''}{c.verdict.label}</p>
      ))}
      <dl className="report-formulas" data-testid="report-formulas">
        {model.explanations.map((x) => (
          <div key={x.key}><dt>{x.name}</dt><dd>{x.formula}<br />Source: {x.source}<br />Inputs: {x.inputs.map(([k, v]) => `${k} = ${v}`).join('; ')}{x.note ? <><br />{x.note}</> : null}</dd></div>
        ))}
      </dl>
      <ReportFit group={group} />
      <h3>Methods</h3>
      <ul>{model.methods.map((m) => <li key={m}>{m}</li>)}</ul>
      <h3>Parameters and cell</h3>
      <table className="data kv"><tbody>{[...model.parameters, ...model.cell].map(([k, v]) => <tr key={k}><th scope="row">{k}</th><td>{v}</td></tr>)}</tbody></table>
      <h3>Files</h3>
      <table className="data" data-testid="report-files">
        <thead><tr><th scope="col">File</th><th scope="col">Size</th><th scope="col">v / (V s⁻¹)</th><th scope="col">SHA-256</th><th scope="col">Layout</th></tr></thead>
        <tbody>{model.files.map((f) => <tr key={f.name}><th scope="row">{f.name}</th><td>{bytes(f.sizeBytes)}</td><td>{scanRate(f.scanRateVPerS)}</td><td className="hash">{f.sha256 ?? '—'}</td><td className="wrap">{f.layout}</td></tr>)}</tbody>
      </table>
    </section>
  );
}

/** "D = … cm²/s (95 % interval … to …); " with the digits the interval supports. */
function diffusionText(d: { diffusionCm2PerS: number; intervalCm2PerS: [number, number] | null }): string {
  const shown = valueWithInterval(d.diffusionCm2PerS, d.intervalCm2PerS);
  return `D = ${shown.value} cm²/s${shown.interval ? ` (95 % interval ${shown.interval})` : ''}; `;
}

/** The series' whole-curve fit, while it is current: model, window, parameters with errors, and its notes. */
function ReportFit({ group }: { group: string }) {
  const entry = useHalfwave((s) => s.fits[group]);
  const current = useHalfwave((s) => s.fitIsCurrent(group));
  const r = entry?.status === 'ready' ? entry.result : null;
  if (!entry || !r || !current) return null;
  const rows = fitParameterRows(r, entry.scale.name);
  return (
    <>
      <h3>Whole-curve fit</h3>
      <p data-testid="report-fit-model">
        Model {entry.setup.mechanism}, {entry.setup.coupleCount} couple{entry.setup.coupleCount > 1 ? 's' : ''}, cycle {entry.setup.cycle ?? 1}; {entry.fileNames.length} files fitted together;
        window {fixed(Math.min(...r.windowV), 3)} … {fixed(Math.max(...r.windowV), 3)} V vs {entry.scale.name}; {r.converged ? `converged after ${r.iterations} iterations` : 'did not converge'}; rms residual {sci(r.rmsA)} A.
        Nonlinear least squares of simulated to measured current (Levenberg–Marquardt); standard errors from the Jacobian at the optimum.
      </p>
      <table className="data" data-testid="report-fit">
        <thead><tr><th scope="col">Parameter</th><th scope="col">Value</th><th scope="col">± standard error</th><th scope="col">95 % interval</th><th scope="col">What the data say</th></tr></thead>
        <tbody>{rows.map((p) => (
          <tr key={`${p.key}-${p.couple ?? 'all'}`}><th scope="row">{p.symbol}{p.couple !== null && entry.setup.coupleCount > 1 ? ` (couple ${p.couple + 1})` : ''}{p.unit ? ` / ${p.unit}` : ''}</th><td>{p.value}</td><td>{p.error}</td><td>{p.interval}</td><td className="wrap">{p.reading}</td></tr>
        ))}</tbody>
      </table>
      {r.notes.length ? <ul>{r.notes.map((n) => <li key={n}>{n}</li>)}</ul> : null}
    </>
  );
}

/** The series' diagnostic figures as SVG data URLs (made by Plotly in this page). */
function useReportFigures(couple: Parameters<typeof buildSeriesFigures>[0] | null, scaleName: string): { url: string; caption: string }[] {
  const [out, setOut] = useState<{ url: string; caption: string }[]>([]);
  useEffect(() => {
    if (!couple) return undefined;
    let alive = true;
    const figs = buildSeriesFigures(couple, scaleName);
    const list = [
      [figs.current, 'Forward peak current against the square root of the scan rate, with the fit and its 95 % band'],
      [figs.logLog, 'log peak current against log scan rate'],
      [figs.peakPotential, 'Peak potentials against log scan rate'],
    ] as const;
    void Promise.all(list.map(async ([f, caption]) => ({ url: await figureImageUrl(f.data, f.layout, 'svg'), caption }))).then((r) => alive && setOut(r));
    return () => {
      alive = false;
    };
  }, [couple, scaleName]);
  return out;
}

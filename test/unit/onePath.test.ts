/**
 * One run model: the screen (the store as the app starts it, with the worker's handlers run
 * in-thread), the results sheet (CSV and JSON, made by the worker's export) and `analyze --json`
 * (the command line, given the screen's saved session) give identical E½, ΔEp, ip, D, k°, Γ,
 * k_f, k_s, capacitance and warnings, for the demo data and for a hand-edited session with peak
 * windows, a baseline choice and another display scale. This is a property of the code's
 * structure (one path), so the comparison is exact: no published value is involved.
 * The CSV prints 10 significant digits, so it is compared at that precision.
 */
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runCli } from '../../src/cli/main';
import type { RunContract } from '../../src/io';
import { startApp } from '../../src/state/app';
import { demoInputsOf } from '../../src/state/demo';
import { demoBundleBytes } from '../../scripts/demoBundle';
import { openSessionText, saveSessionText } from '../../src/state/sessionActions';
import { memoryStorageAdapter } from '../../src/state/storage';
import { createHalfwaveStore } from '../../src/state/store';
import type { HalfwaveStore } from '../../src/state/types';
import { createInThreadClient } from '../../src/worker/inThreadClient';

const DEMO = join(import.meta.dirname, '..', '..', 'demo-data');
const dir = mkdtempSync(join(tmpdir(), 'halfwave-one-path-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

interface CoupleNumbers { Epa: number | null; Epc: number | null; Ehalf: number | null; dEp: number | null; ipa: number | null; ipc: number | null; ratio: number | null }
interface SeriesNumbers { slope: number | null; D: number | null; k0: number | null; k0LowerBound: number | null; gamma: number | null; kf: number | null; ks: number | null; Ehalf: number | null }

/** Per file name, cycle and couple; per series key and couple. */
interface Numbers {
  couples: Record<string, CoupleNumbers>;
  series: Record<string, SeriesNumbers>;
  capacitance: Record<string, number | null>;
  warnings: string[];
}

const nn = (x: number | null | undefined): number | null => (x === null || x === undefined || !Number.isFinite(x) ? null : x);

/** What the screen holds: each file's run result and each series' result in the store. */
async function screenNumbers(store: HalfwaveStore): Promise<Numbers> {
  const s0 = store.getState();
  for (const g of s0.groups()) await s0.analyzeGroup(g);
  const s = store.getState();
  const out: Numbers = { couples: {}, series: {}, capacitance: {}, warnings: [] };
  for (const id of s.fileOrder) {
    const run = s.results[id]?.run;
    if (!run) throw new Error(`no result for ${s.files[id]?.fileName}`);
    // What the importer could only guess or doubt: shown beside the file on screen, first among the contract's warnings.
    out.warnings.push(...(run.provenance.importWarnings ?? []), ...run.warnings.map((w) => `${run.fileName}: ${w.message}`));
    for (const c of run.analysis.cycles) {
      for (const k of c.couples) {
        out.couples[`${run.fileName}|${c.index}|${k.index}`] = {
          Epa: nn(k.epaV), Epc: nn(k.epcV), Ehalf: nn(k.eHalfV), dEp: nn(k.deltaEpV), ipa: nn(k.ipaA), ipc: nn(k.ipcA), ratio: nn(k.ratio),
        };
      }
    }
  }
  const many = s.groups().length > 1;
  for (const g of s.groups()) {
    const r = s.series[g]?.result;
    if (!r) throw new Error(`no series result for ${g}`);
    out.capacitance[g] = nn(r.capacitance?.capacitanceFPerCm2);
    out.warnings.push(...r.warnings.map((w) => (w.fileName ? `${w.fileName}: ${w.message}` : many ? `${g}: ${w.message}` : w.message)));
    for (const c of r.analysis.couples) {
      out.series[`${g}|${c.index}`] = {
        slope: nn(c.forwardFit?.slope), D: nn(c.diffusion?.diffusionCm2PerS), k0: nn(c.rateConstant?.k0CmPerS), k0LowerBound: nn(c.rateConstant?.lowerBoundCmPerS),
        gamma: nn(c.surface?.coverageFromChargeMolPerCm2 ?? c.surface?.coverageFromSlopeMolPerCm2), kf: nn(c.followUp?.rateConstantPerS),
        ks: nn(c.surface?.ksPerS), Ehalf: nn(c.eHalfV),
      };
    }
  }
  return out;
}

/** The same numbers read back from the contract object (analyze --json, or the JSON results sheet). */
function contractNumbers(doc: RunContract, fileNameOf: (given: string) => string): Numbers {
  const out: Numbers = { couples: {}, series: {}, capacitance: {}, warnings: doc.warnings };
  for (const f of doc.files) {
    for (const c of f.cycles) {
      c.couples.forEach((k, i) => {
        out.couples[`${fileNameOf(f.file)}|${c.index}|${i}`] = { Epa: k.Epa, Epc: k.Epc, Ehalf: k.Ehalf, dEp: k.dEp, ipa: k.ipa, ipc: k.ipc, ratio: k.ratio };
      });
    }
  }
  for (const c of doc.series) {
    out.series[`${c.series}|${c.couple}`] = { slope: c.slope, D: c.D, k0: c.k0, k0LowerBound: c.k0LowerBound, gamma: c.gamma, kf: c.kf, ks: c.ks, Ehalf: c.Ehalf };
  }
  for (const g of doc.seriesGroups) out.capacitance[g.series] = g.capacitance?.Cd ?? null;
  return out;
}

/** The couples and series tables of the CSV sheet, rounded as the CSV rounds (10 significant digits). */
function csvNumbers(csv: string): { couples: Record<string, CoupleNumbers>; series: Record<string, Partial<SeriesNumbers>> } {
  const table = (name: string) => {
    const block = csv.split('\n\n').find((b) => b.startsWith(`# table: ${name}\n`)) ?? '';
    return Papa.parse<Record<string, string>>(block.slice(block.indexOf('\n') + 1).trim(), { header: true }).data;
  };
  const num = (v: string | undefined) => (v === undefined || v === '' ? null : Number(v));
  const couples: Record<string, CoupleNumbers> = {};
  for (const r of table('raw couples')) {
    couples[`${r.file}|${r.cycle}|${r.couple}`] = {
      Epa: num(r.Epa_V), Epc: num(r.Epc_V), Ehalf: num(r.E_half_V), dEp: num(r.dEp_V), ipa: num(r.ipa_A), ipc: num(r.ipc_A), ratio: num(r.ratio_return_over_forward),
    };
  }
  const series: Record<string, Partial<SeriesNumbers>> = {};
  for (const r of table('raw series')) series[`${r.series}|${r.couple}`] = { slope: num(r.slope_ip_vs_sqrt_v_A_s05_V05), D: num(r.D_cm2_per_s), k0: num(r.k0_cm_per_s), ks: num(r.ks_per_s) };
  return { couples, series };
}

const ten = (x: number | null | undefined) => (x === null || x === undefined ? null : Number(x.toPrecision(10)));

function roundedCouples(c: Record<string, CoupleNumbers>): Record<string, CoupleNumbers> {
  return Object.fromEntries(Object.entries(c).map(([k, v]) => [k, {
    Epa: ten(v.Epa), Epc: ten(v.Epc), Ehalf: ten(v.Ehalf), dEp: ten(v.dEp), ipa: ten(v.ipa), ipc: ten(v.ipc), ratio: ten(v.ratio),
  }]));
}

async function cliNumbers(sessionPath: string): Promise<Numbers> {
  let out = '';
  let err = '';
  const code = await runCli(['analyze', DEMO, '--session', sessionPath, '--json'], { stdout: (t) => { out += t; }, stderr: (t) => { err += t; } });
  expect(err).toBe('');
  expect(code).toBe(0);
  return contractNumbers(JSON.parse(out) as RunContract, (given) => given.slice(given.lastIndexOf('/') + 1));
}

async function expectOnePath(store: HalfwaveStore, label: string): Promise<Numbers> {
  const screen = await screenNumbers(store);
  expect(Object.keys(screen.couples).length).toBeGreaterThan(40);
  expect(Object.keys(screen.series).length).toBeGreaterThanOrEqual(4);
  const sheetJson = contractNumbers(JSON.parse(await store.getState().exportGroup(null, 'json')) as RunContract, (f) => f);
  const sheetCsv = csvNumbers(await store.getState().exportGroup(null, 'csv'));
  const sessionPath = join(dir, `${label}.json`);
  writeFileSync(sessionPath, await saveSessionText(store, false));
  const cli = await cliNumbers(sessionPath);
  expect(sheetJson.couples).toEqual(screen.couples);
  expect(sheetJson.series).toEqual(screen.series);
  expect(sheetJson.capacitance).toEqual(screen.capacitance);
  expect([...sheetJson.warnings].sort()).toEqual([...screen.warnings].sort());
  expect(cli.couples).toEqual(screen.couples);
  expect(cli.series).toEqual(screen.series);
  expect(cli.capacitance).toEqual(screen.capacitance);
  expect([...cli.warnings].sort()).toEqual([...screen.warnings].sort());
  expect(sheetCsv.couples).toEqual(roundedCouples(screen.couples));
  for (const [key, s] of Object.entries(screen.series)) {
    expect(sheetCsv.series[key]).toEqual({ slope: ten(s.slope), D: ten(s.D), k0: ten(s.k0), ks: ten(s.ks) });
  }
  return screen;
}

describe('the screen, the results sheet and analyze --json compute through one path', () => {
  let demoStore: HalfwaveStore;
  beforeAll(async () => {
    demoStore = createHalfwaveStore({ client: createInThreadClient(), storage: null });
    // The demo document as the build serves it (scripts/demoBundle.ts), read from demo-data/.
    await startApp(demoStore, memoryStorageAdapter(), async () => ({ inputs: demoInputsOf(new Uint8Array(demoBundleBytes('demo-data'))), problem: null }));
  }, 120_000);

  it('on the demo data as the app opens it', async () => {
    const n = await expectOnePath(demoStore, 'demo');
    // The demo's four scenarios are four series, with D, k°, Γ and k_f where they apply.
    expect(Object.values(n.series).some((s) => s.D !== null)).toBe(true);
    expect(Object.values(n.series).some((s) => s.gamma !== null)).toBe(true);
  }, 120_000);

  it('on a hand-edited session: peak windows, a baseline choice, a cell value and the SCE scale', async () => {
    const doc = JSON.parse(await saveSessionText(demoStore, false)) as {
      settings: { reference: { displayReference: string }; seriesCells: Record<string, Record<string, unknown>> };
      files: Array<{ fileName: string; analysis: Record<string, unknown> }>;
    };
    doc.settings.reference.displayReference = 'SCE';
    doc.settings.seriesCells['probe RuHex'] = { ...doc.settings.seriesCells['probe RuHex'], resistanceOhm: 120 };
    const probe = doc.files.find((f) => f.fileName === 'probe_RuHex_100mVs.csv');
    const quasi = doc.files.find((f) => f.fileName === 'quasi_FcAmide_run03.txt');
    if (!probe || !quasi) throw new Error('demo files missing from the session');
    // Windows and anchors are on the files' own recording scale (Ag/AgCl, 3 M KCl).
    probe.analysis = { peakWindows: [{ direction: 'cathodic', fromV: -0.35, toV: -0.05 }], baselines: [{ direction: 'anodic', fromV: -0.4, toV: 0, method: 'polynomial' }] };
    quasi.analysis = { peakWindows: [{ direction: 'anodic', fromV: 0.1, toV: 0.45 }], baselines: [] };
    const fresh = createHalfwaveStore({ client: createInThreadClient(), storage: null });
    await openSessionText(fresh, JSON.stringify(doc));
    const names = readdirSync(DEMO).filter((n) => !n.endsWith('.md')).sort();
    await fresh.getState().addFiles(names.map((name) => ({ name, data: readFileSync(join(DEMO, name), 'utf8') })));
    const edited = await expectOnePath(fresh, 'edited');
    const demo = await screenNumbers(demoStore);
    // The edits took effect: the scale moved every E½, and Ru narrowed the probe's ΔEp.
    const key = 'probe_RuHex_100mVs.csv|1|0';
    expect(edited.couples[key]?.Ehalf).not.toBe(demo.couples[key]?.Ehalf);
    expect(edited.couples[key]?.dEp as number).toBeLessThan(demo.couples[key]?.dEp as number);
  }, 120_000);
});

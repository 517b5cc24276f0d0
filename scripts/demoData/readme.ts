/**
 * Text of demo-data/README.md, built from the scenario table so that the
 * documented "truth" can never drift from the parameters the files were simulated with.
 */
import { FARADAY_C_PER_MOL as F, inverseThermalVoltagePerV } from '../../src/core/constants';
import { DEFAULT_SIMULATION } from '../../src/core/simulation';
import { MASTER_SEED, SERIES, type DemoSeries, type Layout } from './scenario';

const LAYOUTS: Record<Layout, string> = {
  commaHeader: 'comma-separated, header `Potential/V,Current/A,Time/s`, LF line ends; scan rate from the time column and the file name',
  semicolonPreamble: 'free-text preamble (operator, sample, electrodes, `scan rate = … mV/s`), then `E / V;I / µA` with semicolons and decimal commas; LF; scan rate only in the preamble',
  tabMilliBom: 'UTF-8 with byte-order mark, CRLF line ends, tab-separated `Time (s)`, `Potential (mV)`, `Current (µA)`; scan rate from the time column and the file name',
  spaceCycleNoHeader: 'no header; aligned whitespace columns: cycle number, potential in V, current in A; scan rate only in the file name',
};

const f = inverseThermalVoltagePerV(DEFAULT_SIMULATION.temperatureK);

/** Six significant digits; exponent form for small magnitudes. */
function fmt(x: unknown): string {
  if (typeof x !== 'number') return String(x);
  const r = Number(x.toPrecision(6));
  return r !== 0 && Math.abs(r) < 1e-3 ? r.toExponential() : String(r);
}

function expectations(s: DemoSeries): string[] {
  const t = { ...DEFAULT_SIMULATION, ...s.truth };
  const n = t.electronCount;
  if (t.mechanism === 'surface') {
    const q = n * F * t.areaCm2 * t.coverageMolPerCm2;
    return [
      `Charge under one wave Q = nFAΓ = ${(q * 1e9).toFixed(1)} nC; ip/v at slow scans = n²F²AΓ/(4RT) = ${((n * n * F * F * t.areaCm2 * t.coverageMolPerCm2 * f) / (4 * F) * 1e6).toFixed(3)} µA per V/s (before charging and noise).`,
      `Laviron: k_s = ${t.surfaceRatePerS} s⁻¹, α = ${t.alpha}; ΔEp exceeds 200 mV from about 10 V/s.`,
    ];
  }
  const dO = t.diffusionOCm2PerS;
  const c = Math.max(t.concentrationOMolPerCm3, t.concentrationRMolPerCm3);
  const slope = 0.4463 * n * F * t.areaCm2 * c * Math.sqrt(n * f * dO);
  const lines = [`Randles–Ševčík slope of the forward peak (reversible limit) = ${(slope * 1e6).toFixed(2)} µA per (V/s)^½ (0.4463·nFAC(nFD/RT)^½).`];
  if (t.mechanism === 'E') {
    const psis = s.scanRatesVPerS.map((v) => `${v} V/s: ${(t.k0CmPerS / Math.sqrt(Math.PI * dO * n * f * v)).toFixed(2)}`);
    lines.push(`Nicholson ψ = k°/(πDnFv/RT)^½ per scan rate — ${psis.join('; ')}.`);
  } else {
    lines.push(`EC: k_f = ${t.followUpRatePerS} s⁻¹; k_f·RT/(nFv) runs from ${(t.followUpRatePerS / (n * f * Math.max(...s.scanRatesVPerS))).toFixed(3)} to ${(t.followUpRatePerS / (n * f * Math.min(...s.scanRatesVPerS))).toFixed(2)} over the series.`);
  }
  lines.push(`Ohmic drop at the largest peak: about ${(t.uncompensatedOhm * slope * Math.sqrt(Math.max(...s.scanRatesVPerS)) * 1000).toFixed(1)} mV (R_u = ${t.uncompensatedOhm} Ω).`);
  return lines;
}

function seriesSection(s: DemoSeries): string {
  const t = { ...DEFAULT_SIMULATION, ...s.truth };
  const files = s.scanRatesVPerS.map((v, i) => `| \`${s.fileName(v, i + 1)}\` | ${v} |`).join('\n');
  const params = [
    ['mechanism', t.mechanism], ['E°′ (V vs Ag/AgCl)', t.formalPotentialV], ['n', t.electronCount], ['α', t.alpha],
    ...(t.mechanism === 'surface'
      ? [['Γ (mol/cm²)', t.coverageMolPerCm2], ['k_s (1/s)', t.surfaceRatePerS]]
      : [['k° (cm/s)', t.k0CmPerS], ['D_O, D_R (cm²/s)', `${fmt(t.diffusionOCm2PerS)}, ${fmt(t.diffusionRCm2PerS)}`],
        ['bulk C_O, C_R (mM)', `${fmt(t.concentrationOMolPerCm3 * 1e6)}, ${fmt(t.concentrationRMolPerCm3 * 1e6)}`]]),
    ...(t.mechanism === 'EC' ? [['k_f (1/s)', t.followUpRatePerS]] : []),
    ['area (cm²)', t.areaCm2], ['window (V)', `${t.startV} → ${t.switchV} → ${t.startV}, ${t.cycles} cycle(s), ${fmt(t.stepV * 1000)} mV steps`],
    ['C_dl (µF/cm²)', fmt(t.doubleLayerFPerCm2 * 1e6)], ['R_u (Ω)', t.uncompensatedOhm], ['noise (nA rms, white)', fmt(s.noiseA * 1e9)], ['T (K)', t.temperatureK],
  ].map(([k, v]) => `| ${k} | ${fmt(v)} |`).join('\n');
  return `### ${s.title}

${s.question}

Sample: ${s.sample}. Electrode: ${s.electrode}. Layout: ${LAYOUTS[s.layout]}.

| file | scan rate (V/s) |
| --- | --- |
${files}

Truth (simulator input):

| parameter | value |
| --- | --- |
${params}

${expectations(s).map((l) => `- ${l}`).join('\n')}
`;
}

export function demoReadme(): string {
  return `# Demo scenario: characterising a new carbon paste

*Everything here is invented and simulated.* The lab, the people, the electrode and the compound
codes are fictional; every file was computed by Halfwave's own simulator
(\`src/core/simulation\`) and written by \`npm run demo-data\` (seed ${MASTER_SEED}; reruns give identical
files). No file comes from a real instrument.

**Who and why.** In the (fictional) electroanalysis group of Dr. Adaeze Okafor at the Northfield
Institute of Applied Chemistry, PhD student Tomasz Wieland is characterising *CPE-7*, an in-house
carbon-paste electrode (3 mm disk) meant for an amperometric sensor. Before trusting it he runs an
outer-sphere probe at six scan rates, then measures the electron-transfer rate of the group's new
ferrocenyl amide *FcAm-2*, the follow-up chemistry of the oxidised aminophenol *AP-3*, and a
ferrocenyl-thiol monolayer on a 2 mm gold disk that will serve as the reference film for the sensor
coating. All potentials are against Ag/AgCl (3 M KCl), 25 °C; currents follow the IUPAC convention
(anodic positive) in every file.

**Start.** \`npm start\`, then open http://127.0.0.1:5173: the workbench starts with this scenario
loaded. From the command line:
\`npm run --silent cli -- analyze demo-data --inspect\`. Regenerate with \`npm run demo-data\`.

Each file carries a double-layer charging background, an uncompensated resistance and seeded
white noise, as a measurement would. The "truth" below is what the analysis should recover, within what
noise, charging and ohmic drop allow; tests can import the same table from
\`scripts/demoData/scenario.ts\` (\`SERIES\`, with \`DEFAULT_SIMULATION\` for unlisted fields).

## Series

${SERIES.map(seriesSection).join('\n')}
## Safety (for anyone repeating such work for real)

Follow your institution's rules and licensed practice; these notes do not replace them.
- Hexaammineruthenium(III) chloride and aminophenols are harmful (aminophenols can sensitise the
  skin); wear gloves and eye protection and collect ruthenium waste separately.
- Sodium perchlorate is a strong oxidiser: keep it away from organic material and reducing agents,
  and dispose of it as the local rules for perchlorates require.
- Gold electrodes are often cleaned with hot acid mixtures that react violently with organic
  matter; use only procedures approved at your site.
- The reference here is Ag/AgCl, without mercury. If you use a calomel electrode instead, treat
  it as mercury-containing waste.
`;
}

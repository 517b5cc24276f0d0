/** The published methods an analysis run relies on, one line each, for the results sheet. */
import { formatBand, LOG_LOG_DIFFUSION_BAND, LOG_LOG_SURFACE_BAND } from '../series/logLogSlope';

export const RUN_METHODS: string[] = [
  'Peak current vs v^½ and D: Randles–Ševčík, reversible 0.4463·nFAC(nFvD/RT)^½ or irreversible 0.4958·nFAC(αnₐFvD/RT)^½ (Bard & Faulkner 2nd ed. §6.2, §6.3; Nicholson & Shain, Anal. Chem. 36, 706 (1964))',
  'Straight-line fits: least squares with Student-t 95 % intervals (Draper & Smith, Applied Regression Analysis, 3rd ed. 1998)',
  `log|ip| vs log v slope read as ${formatBand(LOG_LOG_DIFFUSION_BAND)} diffusion, ${formatBand(LOG_LOG_SURFACE_BAND)} adsorbed/capacitive (bands: common practice, no source)`,
  'Every α is αc, the cathodic transfer coefficient (of O + ne⁻ → R; an oxidation runs with 1 − αc); the forward wave\'s α·nₐ from |dEp/dlog v| = (ln 10)RT/(2αnₐF), for a totally irreversible series only (Wang, Analytical Electrochemistry 2nd ed. 2000, eq. 2-5); otherwise αc assumed 0.5 with D and k° over 0.3–0.7',
  "k° by Nicholson's ψ (Anal. Chem. 37, 1351 (1965), Table I, interpolated; the Lavagnini et al. fit, Electroanalysis 16, 505 (2004), on request), with the (D_R/D_O)^(α/2) factor; ψ for αc ≠ 0.5 and K(ψ) from simulated working curves",
  'k° beyond the table from the forward peak, Ep = E°′ ∓ (RT/αnₐF)[0.780 + ln(D^½/k°) + ½ ln(αnₐFv/RT)] (Wang eq. 2-5; Bard & Faulkner §6.3), E°′ given or from the return peak with its departure from that equation simulated',
  'Follow-up reactions: the return/forward ratio against λ = k_f·RT/(nFv) and the current function 0.4463–0.4958 (Nicholson & Shain 1964; ratio by Nicholson, Anal. Chem. 38, 1406 (1966)), one k_f for all files',
  'Per-file verdict: ΔEp against the reversible value at the file\'s switch (Nicholson, Anal. Chem. 37, 1351 (1965)) + 0.31·RT/nF, irreversible beyond 8.25·RT/nF, chemically coupled with a return/forward ratio outside 0.8–1.2 (zones: common practice, no source; not the Λ zones of Matsuda & Ayabe, Z. Elektrochem. 59, 494 (1955), from memory, as Λ is not measured from one voltammogram); E½ = (Epa + Epc)/2 lies (ΔEp − 2.218·RT/nF)/2 from E°′ towards the return peak when the switch is close (flagged)',
  'Ohmic drop against slow kinetics: each peak moves by i·Ru (Bard & Faulkner §1.3.4); k° only a lower bound where the drop can explain the widening',
  'Surface-confined couples: ip = n²F²AΓv/4RT, Q = nFAΓ (Laviron, J. Electroanal. Chem. 52, 355 (1974)); beyond n·ΔEp = 200 mV ip = αnFQv/(2.718RT) and αc from the Ep–log v lines, k_s and E°′ from every file on the general working curve (Laviron, J. Electroanal. Chem. 101, 19 (1979), integrated here); ohmic drop on a film from the simulated Nernstian film with Ru',
  'Double-layer capacitance: forward–reverse gap (median over ± 10 mV, less a Nernstian film\'s own current, Laviron 1974), gap/2 = A·Cd·v + c·v^½ (Bard & Faulkner 2nd ed. §1.2; the v^½ term a faradaic tail, §6.2; a leak cancels in the gap)',
  'Reference scales via SHE (Bard & Faulkner inside cover; Sawyer et al. 1995; Int. J. Corrosion 2010, 756950); RHE by the Nernst equation; calomel away from 25 °C after Ives & Janz (1961), Ag/AgCl from E°(T) of Bates & Bower (1954)',
  'iR correction: E − i·Ru with IUPAC current sign',
  'Cycles after the first: measured on the decay the earlier cycles drive, the current that holds the semi-integral of the faradaic current at its value at the cycle\'s start (Bard & Faulkner 2nd ed. §6.7, convolutive voltammetry), the charging current from its step at the turn taken out first; flagged where the start does not bring the surface back to rest',
  'Isolated bad points: Hampel identifier on a 7-point running median (Hampel, J. Am. Stat. Assoc. 69, 383 (1974); Pearson, IEEE Trans. Control Syst. Technol. 10, 55 (2002))',
];

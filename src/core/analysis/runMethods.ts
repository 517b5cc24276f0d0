/** The published methods an analysis run relies on, one line each, for the results sheet. */
import { formatBand, LOG_LOG_DIFFUSION_BAND, LOG_LOG_SURFACE_BAND } from '../series/logLogSlope';

export const RUN_METHODS: string[] = [
  'Peak current vs v^½ and D: Randles–Ševčík, reversible 0.4463·nFAC(nFvD/RT)^½ or irreversible 0.4958·nFAC(αnₐFvD/RT)^½ (Bard & Faulkner 2nd ed. §6.2, §6.3; Nicholson & Shain, Anal. Chem. 36, 706 (1964))',
  'Straight-line fits: least squares with Student-t 95 % intervals (Draper & Smith, Applied Regression Analysis, 3rd ed. 1998)',
  `log|ip| vs log v slope read as ${formatBand(LOG_LOG_DIFFUSION_BAND)} diffusion, ${formatBand(LOG_LOG_SURFACE_BAND)} adsorbed/capacitive (bands: common practice, no source)`,
  'Ep vs log v and α for irreversible couples: |dEp/dlog v| = (ln 10)RT/(2αnₐF) (Wang, Analytical Electrochemistry 2nd ed. 2000, eq. 2-5)',
  "k° by Nicholson's ψ (Anal. Chem. 37, 1351 (1965), Table I), Lavagnini et al. fit (Electroanalysis 16, 505 (2004)) inside 63–141 mV, table to 61–212 mV, with the (D_R/D_O)^(α/2) factor",
  'Surface-confined couples: ip = n²F²AΓv/4RT, Q = nFAΓ (Laviron, J. Electroanal. Chem. 52, 355 (1974)); k_s for n·ΔEp > 200 mV (Laviron, J. Electroanal. Chem. 101, 19 (1979))',
  'Double-layer capacitance: forward–reverse gap = 2·A·Cd·v (Bard & Faulkner 2nd ed. §1.2)',
  'Reference scales via SHE (Bard & Faulkner inside cover; Sawyer et al. 1995; Int. J. Corrosion 2010, 756950); RHE by the Nernst equation',
  'iR correction: E − i·Ru with IUPAC current sign',
];

/** `analyze --help`: the analysis options beyond the fixed contract (parsed in analyzeReport.ts). */
export const ANALYSIS_OPTION_HELP = `Scales, kinetics and further analysis options:
  --ref NAME            report potentials on this reference scale: SHE, SCE, NCE, SSCE, AgCl-sat, AgCl-3M,
                        AgCl-3.5M, AgCl-1M, AgCl-0.1M, MSE-sat, MSE-1M-H2SO4, HgO-1M, HgO-0.1M,
                        RHE (needs --ph), Fc (internal standard)
  --from-ref NAME       scale the files were measured on (default: the file's metadata)
  --ph PH               pH for the RHE scale
  --fc-near V           Fc⁺/Fc: use the couple with E½ nearest V (measured scale) as zero
  --fc-file NAME        ...found in this companion file (given among the files, left out of the series)
  --fc-value V          Fc⁺/Fc: E½ measured elsewhere, in V on the --from-ref scale
  --alpha A             αc, the CATHODIC transfer coefficient (of the reduction O + ne⁻ → R;
                        an oxidation wave runs with 1 − αc), 0.05–0.95. Default: measured from
                        Ep against log v for a totally irreversible series (reported as the
                        forward wave's αnₐ and as αc), else 0.5 with D and k° given over 0.3–0.7
  --na N                electrons in the rate-determining step nₐ (default 1); the irreversible
                        equations use α·nₐ
  --e0 V                E°′ known from elsewhere (V, on the reported scale): k° of a totally
                        irreversible couple then comes from the forward peak alone
  --psi M               ψ from ΔEp: table (Nicholson 1965, interpolated; default) or lavagnini
  --spikes S            hampel (default: isolated bad points left out and listed) or off
  --diffusion CM2_PER_S known D of the species present, used for k° (default: fitted)
  --d-ratio R           D_O/D_R for Nicholson's k° (default 1)
  --ru OHM              uncompensated resistance: potentials corrected to E − i·Ru
  --out-convention C    iupac | polarographic, for signed currents in the output (default iupac)
  --cdl-at V            potential (output scale) of a featureless region: double-layer capacitance
  --cycle N             cycle used for the series (default 1)
  --json-sheet FILE     also write the full results sheet as JSON
  --session FILE        analyse the files as a saved workbench session has them: its method,
                        each series' cell values, each file's series, peak windows and baselines,
                        the display scale and sign convention (files matched by SHA-256, else
                        name); cannot be combined with cell, scale or grouping options
  --blank FILE          a blank (supporting electrolyte alone, same electrode) subtracted before the
                        analysis; give one per scan rate (repeat, or name a folder): each file takes
                        the blank nearest its scan rate, and the pairing is recorded in the results
  --series-by HOW       how files form scan-rate series: auto (default: by folder, a folder of
                        several experiments split by common file-name stem), folder, stem, or one
                        (every file given forms one series)
Mercury reference electrodes (SCE, MSE, Hg/HgO) contain mercury: follow your local safety and
disposal rules.
`;

import { describe, expect, it } from 'vitest';
import { findReferenceElectrode, readReferenceName } from './referenceName';

describe('readReferenceName', () => {
  // A hand-worked case: the filling is read beside its salt, whatever the punctuation.
  it('reads the wordings files use', () => {
    const cases: Array<[string, string]> = [
      ['Ag/AgCl/KCl (3 M)', 'AgCl-3M'], ['Ag|AgCl|KCl(sat)', 'AgCl-sat'], ['Ag/AgCl in 3 M KCl', 'AgCl-3M'],
      ['saturated calomel electrode (SCE)', 'SCE'], ['Hg/Hg2Cl2 (1 M KCl)', 'NCE'], ['Hg/Hg2SO4 (sat. K2SO4)', 'MSE-sat'],
      ['Hg/Hg2Cl2 (0.1 M KCl)', 'calomel-0.1M'], ['Hg/HgO (1 M KOH)', 'HgO-1M-KOH'], ['Ag/AgCl (KCl 3 mol/L)', 'AgCl-3M'],
      // The tool's own labels, with subscripts.
      ['SCE (Hg/Hg₂Cl₂, sat. KCl)', 'SCE'], ['Hg/Hg₂SO₄, sat. K₂SO₄ (MSE)', 'MSE-sat'], ['SHE (standard hydrogen electrode)', 'SHE'],
    ];
    for (const [name, id] of cases) expect(findReferenceElectrode(name)?.id, name).toBe(id);
  });

  // Bard & Faulkner, Electrochemical Methods 2nd ed. (2001), inside back cover: SSCE (calomel, sat. NaCl) 0.236 V vs SHE.
  it('reads calomel in saturated NaCl as the SSCE (0.236 V), never as the SCE', () => {
    expect(findReferenceElectrode('Hg/Hg2Cl2 (sat. NaCl)')?.eVsSheV).toBe(0.236);
    const sce = readReferenceName('SCE (saturated NaCl)');
    expect(sce.electrode?.id).toBe('SSCE');
    expect(sce.assumption).toMatch(/NaCl filling: read as the SSCE/);
  });

  // No published value at hand for Ag/AgCl in NaCl: refused (the chloride activity differs from KCl's; common practice, no source).
  it('refuses Ag/AgCl with an NaCl filling instead of reading it as KCl', () => {
    for (const name of ['Ag/AgCl (3 M NaCl)', 'Ag/AgCl (sat. NaCl)', 'Ag/AgCl (3.5 M NaCl)']) {
      const r = readReferenceName(name);
      expect(r.electrode, name).toBeNull();
      expect(r.refusal, name).toMatch(/NaCl filling is its own electrode/);
    }
  });

  it('names the known fillings when a filling is not in the table', () => {
    expect(readReferenceName('Ag/AgCl (4 M KCl)').refusal).toMatch(/no Ag\/AgCl electrode with 4 M KCl \(known: sat\. KCl, 3\.5 M KCl, 3 M KCl, 1 M KCl, 0\.1 M KCl\)/);
    expect(readReferenceName('Ag/AgCl (1 mM KCl)').refusal).toMatch(/1 mM KCl/);
    expect(readReferenceName('home-made electrode')).toEqual({ electrode: null, refusal: null, assumption: null });
  });

  // Moves from the table values (Bard & Faulkner 2001 inside back cover: sat. KCl 0.197 V; 3 M KCl 0.210 V from memory):
  // an electrode read as sat. KCl that was in fact 3 M KCl puts every converted potential 13 mV higher.
  it('warns what an unqualified name assumed and what the other fillings would change', () => {
    const agcl = readReferenceName('Ag/AgCl');
    expect(agcl.electrode?.id).toBe('AgCl-sat');
    expect(agcl.assumption).toMatch(/taken as Ag\/AgCl, sat\. KCl .*3 M KCl \+13 mV.*0\.1 M KCl \+91 mV/);
    // Bard & Faulkner 2001 inside back cover: SCE 0.2412, NCE 0.2801 V → +39 mV.
    expect(readReferenceName('Calomel').assumption).toMatch(/taken as SCE .*\(NCE\) \+39 mV/);
    expect(readReferenceName('Hg/HgO').assumption).toMatch(/taken as Hg\/HgO, 1 M NaOH .*0\.1 M NaOH \+56 mV/);
    expect(readReferenceName('Ag/AgCl (3 M KCl)').assumption).toBeNull();
  });

  it('says that NHE is converted as SHE', () => {
    expect(readReferenceName('NHE').assumption).toMatch(/NHE read as SHE/);
  });
});

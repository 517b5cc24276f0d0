/**
 * Cautions that go with the scales a run uses, in plain words: mercury in the electrode, the
 * liquid junction that no table value includes, and an aqueous reference electrode used for
 * work in an organic solvent.
 * In: the scales used (recording and reported), whether a tabulated conversion was made, and
 *   whether the work is non-aqueous (the Fc⁺/Fc scale or an internal standard, or a solvent named in
 *   a file's header). Out: one sentence per caution.
 * Sources: junction potentials of a few mV between a concentrated KCl bridge and an aqueous
 *   electrolyte, and the advice to report non-aqueous potentials against Fc⁺/Fc measured in the same
 *   solution: Bard & Faulkner, Electrochemical Methods 2nd ed. (2001) §2.3 (from memory);
 *   G. Gritzner, J. Kůta, Pure Appl. Chem. 56 (1984) 461 (IUPAC recommendation, from memory).
 *   Mercury: safety caution, deferring to local rules (common practice, no source).
 */
import { AQUEOUS_REFERENCES, MERCURY_REFERENCES, REFERENCE_ELECTRODES, type ReferenceId } from './referenceElectrodes';

/** Organic solvents a file's header may name (lower case, whole words). */
const NON_AQUEOUS = /\b(acetonitrile|mecn|ch3cn|dmf|dimethylformamide|dmso|dimethyl ?sulfoxide|thf|tetrahydrofuran|dichloromethane|ch2cl2|dcm|propylene carbonate|nitromethane|benzonitrile|ionic liquid|tbapf6|bu4npf6|tbaclo4|tbabf4)\b/i;

/** The organic solvent or salt named in `text`, or null. */
export function nonAqueousWord(text: string): string | null {
  return NON_AQUEOUS.exec(text)?.[1] ?? null;
}

export interface ReferenceCautionFacts {
  /** Scales used: each file's recording scale and the reported one. */
  used: readonly ReferenceId[];
  /** True when a potential moved between two tabulated scales. */
  converted: boolean;
  /** Why the work looks non-aqueous (Fc⁺/Fc scale, a solvent named); null when nothing says so. */
  nonAqueousBecause: string | null;
}

const labelOf = (id: ReferenceId) => REFERENCE_ELECTRODES.find((r) => r.id === id)?.label ?? id;

export function referenceCautions(facts: ReferenceCautionFacts): string[] {
  const used = [...new Set(facts.used)];
  const out: string[] = [];
  const mercury = used.filter((id) => MERCURY_REFERENCES.includes(id));
  if (mercury.length) {
    out.push(`${mercury.map(labelOf).join(', ')}: contains mercury, which is toxic — handle, store and dispose of the electrode and any spill as your local rules say`);
  }
  const aqueous = used.filter((id) => AQUEOUS_REFERENCES.includes(id));
  if (facts.converted && aqueous.length) {
    out.push('liquid junction: the table values leave out the junction between the reference electrode\'s filling and the cell\'s electrolyte, typically a few mV with a concentrated KCl filling and more across very different electrolytes (Bard & Faulkner 2001 §2.3, from memory); converted potentials carry that uncertainty');
  }
  if (facts.nonAqueousBecause && aqueous.length) {
    out.push(`aqueous reference electrode (${aqueous.map(labelOf).join(', ')}) with non-aqueous work (${facts.nonAqueousBecause}): the junction between water and the organic solvent adds an unknown, drifting potential (often tens of mV) and water and salt leak into the cell; report against Fc⁺/Fc measured in the same solution (IUPAC: Gritzner & Kůta 1984, from memory)`);
  }
  return out;
}

/**
 * Linear expansion coefficients near 20 °C, µm/(m·K), with where each value comes from.
 */
export interface Material { id: string; name: string; alphaPerK: number; source: string }

export const MATERIALS: readonly Material[] = [
  { id: 'aluminium', name: 'Aluminium alloy', alphaPerK: 23.1e-6, source: 'NIST, J. Res. NIST, uncertainties in temperature and CTE (PMC8345254) [published, REFERENCES.md §8]' },
  { id: 'steel', name: 'Steel (carbon, low alloy)', alphaPerK: 11.5e-6, source: 'NIST, J. Res. NIST, uncertainties in temperature and CTE (PMC8345254) [published, REFERENCES.md §8]' },
  { id: 'stainless', name: 'Stainless steel, austenitic', alphaPerK: 17.3e-6, source: 'from memory (handbook value for 304/316)' },
  { id: 'cast-iron', name: 'Grey cast iron', alphaPerK: 10.5e-6, source: 'from memory (handbook value)' },
  { id: 'brass', name: 'Brass', alphaPerK: 19e-6, source: 'from memory (handbook value)' },
  { id: 'titanium', name: 'Titanium alloy Ti-6Al-4V', alphaPerK: 8.6e-6, source: 'from memory (handbook value)' },
  { id: 'copper', name: 'Copper', alphaPerK: 16.8e-6, source: 'from memory (handbook value)' },
];

const ALIASES: Record<string, string> = {
  aluminum: 'aluminium', al: 'aluminium', alu: 'aluminium', 'carbon steel': 'steel', 'tool steel': 'steel',
  'stainless steel': 'stainless', inox: 'stainless', 'cast iron': 'cast-iron', ti: 'titanium', 'ti-6al-4v': 'titanium',
};

/** Words that name a material inside a longer description ("6082-T6 aluminium"), most specific first. */
const WORDS: ReadonlyArray<[string, string]> = [
  ['stainless', 'stainless'], ['inox', 'stainless'], ['cast iron', 'cast-iron'], ['titanium', 'titanium'], ['ti-6al-4v', 'titanium'],
  ['brass', 'brass'], ['copper', 'copper'], ['aluminium', 'aluminium'], ['aluminum', 'aluminium'], ['steel', 'steel'],
];

/** Finds a material by id, name, a common alias or a word in a longer description (case-insensitive); null when unknown. */
export function findMaterial(name: string | undefined): Material | null {
  if (!name) return null;
  const key = name.trim().toLowerCase();
  const id = ALIASES[key] ?? WORDS.find(([w]) => key.includes(w))?.[1] ?? key;
  return MATERIALS.find((m) => m.id === id || m.name.toLowerCase() === key) ?? null;
}

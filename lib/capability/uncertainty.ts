/**
 * Uncertainty budget per characteristic, GUM-style (JCGM 100:2008): standard
 * uncertainties combined by root-sum-square, expanded with k = 2. Components: probe
 * repeatability (entered as 2σ of single points, reduced by the number of points),
 * calibration of the effective stylus diameter, the machine's contribution
 * E = a + L/b µm (entered per machine, taken as a rectangular limit), and temperature
 * (uncertainty of the part temperature and of the expansion coefficient; an unmeasured
 * part is taken as anywhere within ±assumedRangeK of 20 °C).
 * Sensitivities to the repeatability are those of least-squares estimates from n
 * evenly spread points (checked by seeded Monte Carlo in tests/unit/capability): radius σ/√n, centre coordinate
 * σ·√(2/n); a form or orientation value is the difference of two points (√2·σ).
 */
import type { Characteristic } from '../features/schema';

export interface MachineContribution { aUm: number; bMm: number }

export interface MeasurementConditions {
  /** 2σ of single-point repeatability, mm. */
  probeRepeatability2Sigma?: number;
  /** Expanded (k = 2) uncertainty of the calibrated effective diameter, mm. */
  effectiveDiameterU?: number;
  machine?: MachineContribution;
  partTemperatureC?: number;
  /** Standard uncertainty of the measured part temperature, K. */
  temperatureUncertaintyK?: number;
  /** Relative standard uncertainty of the expansion coefficient. */
  alphaRelativeUncertainty?: number;
  /** Half-range around 20 °C assumed when no part temperature is given, K. */
  assumedRangeK?: number;
}

/** Defaults used when a workspace has entered nothing; every use is flagged `assumed`. */
export const DEFAULT_CONDITIONS = {
  probeRepeatability2Sigma: 0.001,
  effectiveDiameterU: 0.001,
  machine: { aUm: 3, bMm: 250 },
  temperatureUncertaintyK: 0.5,
  alphaRelativeUncertainty: 0.1,
  assumedRangeK: 3,
} as const;

export interface BudgetComponent {
  name: 'repeatability' | 'effective-diameter' | 'machine' | 'temperature';
  /** Standard uncertainty contributed to the characteristic, mm. */
  standardUncertainty: number;
  assumed: boolean;
  note: string;
}

export interface UncertaintyBudget {
  components: BudgetComponent[];
  combinedStandard: number;
  k: 2;
  /** Expanded uncertainty U = k·u_c, mm. */
  U: number;
}

export interface BudgetInput {
  characteristic: Characteristic;
  /** Points that determine the characteristic (the feature's, or the fewest of the features involved). */
  points: number;
  /** Length the machine error and the temperature act over, mm (size, or distance from the datum origin). */
  lengthMm: number;
  alphaPerK: number | null;
  conditions: MeasurementConditions;
}

const SIZE = new Set<Characteristic>(['diameter', 'width']);
const FORM = new Set<Characteristic>(['flatness', 'circularity', 'cylindricity', 'perpendicularity', 'parallelism']);

function repeatabilitySensitivity(c: Characteristic, n: number): number {
  if (SIZE.has(c)) return 2 / Math.sqrt(n);
  if (c === 'position') return 2 * Math.sqrt(2 / n);
  return Math.SQRT2; // form, orientation, profile: two single points
}

function calibrationSensitivity(c: Characteristic): number {
  if (SIZE.has(c)) return 1;
  if (c === 'profile') return 0.5;
  return 0;
}

export function uncertaintyBudget(input: BudgetInput): UncertaintyBudget {
  const c = input.conditions;
  const n = Math.max(1, input.points);
  const rep2s = c.probeRepeatability2Sigma ?? DEFAULT_CONDITIONS.probeRepeatability2Sigma;
  const calU = c.effectiveDiameterU ?? DEFAULT_CONDITIONS.effectiveDiameterU;
  const machine = c.machine ?? DEFAULT_CONDITIONS.machine;
  const sens = repeatabilitySensitivity(input.characteristic, n);
  const components: BudgetComponent[] = [
    {
      name: 'repeatability', standardUncertainty: (rep2s / 2) * sens, assumed: c.probeRepeatability2Sigma === undefined,
      note: `2σ ${rep2s} mm per point, ${n} points, sensitivity ${sens.toFixed(3)}`,
    },
    {
      name: 'effective-diameter', standardUncertainty: (calU / 2) * calibrationSensitivity(input.characteristic), assumed: c.effectiveDiameterU === undefined,
      note: `calibration U ${calU} mm (k = 2)`,
    },
  ];
  const formLike = FORM.has(input.characteristic);
  const eUm = machine.aUm + input.lengthMm / machine.bMm;
  components.push({
    name: 'machine', standardUncertainty: eUm / 1000 / Math.sqrt(3), assumed: c.machine === undefined,
    note: `E = ${machine.aUm} + L/${machine.bMm} µm at L = ${input.lengthMm.toFixed(1)} mm, rectangular`,
  });
  components.push(temperatureComponent(input, formLike));
  const combinedStandard = Math.sqrt(components.reduce((s, k) => s + k.standardUncertainty ** 2, 0));
  return { components, combinedStandard, k: 2, U: 2 * combinedStandard };
}

function temperatureComponent(input: BudgetInput, formLike: boolean): BudgetComponent {
  const c = input.conditions;
  const alpha = input.alphaPerK;
  if (formLike || input.lengthMm === 0) {
    return { name: 'temperature', standardUncertainty: 0, assumed: false, note: 'a form or orientation value scales negligibly with temperature' };
  }
  if (alpha === null) {
    return { name: 'temperature', standardUncertainty: 0, assumed: true, note: 'material unknown: temperature not budgeted' };
  }
  const uAlpha = alpha * (c.alphaRelativeUncertainty ?? DEFAULT_CONDITIONS.alphaRelativeUncertainty);
  if (c.partTemperatureC === undefined) {
    const range = c.assumedRangeK ?? DEFAULT_CONDITIONS.assumedRangeK;
    return {
      name: 'temperature', standardUncertainty: (input.lengthMm * alpha * range) / Math.sqrt(3), assumed: true,
      note: `part temperature not measured: taken within ±${range} K of 20 °C, uncorrected`,
    };
  }
  const uT = c.temperatureUncertaintyK ?? DEFAULT_CONDITIONS.temperatureUncertaintyK;
  const dT = c.partTemperatureC - 20;
  return {
    name: 'temperature', standardUncertainty: input.lengthMm * Math.sqrt((alpha * uT) ** 2 + (dT * uAlpha) ** 2), assumed: c.temperatureUncertaintyK === undefined,
    note: `corrected from ${c.partTemperatureC} °C; u(T) ${uT} K, u(α)/α ${(uAlpha / alpha).toFixed(2)}`,
  };
}

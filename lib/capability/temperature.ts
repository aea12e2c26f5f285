/**
 * Lengths measured on a part at temperature T corrected to the 20 °C reference of the
 * drawing (ISO 1): L₂₀ = L_T / (1 + α (T − 20)). The machine's own scales are taken as
 * compensated (a machine contribution belongs in the uncertainty budget).
 */
import type { Material } from './materials';

export const REFERENCE_TEMPERATURE_C = 20;

export interface TemperatureCorrection {
  applied: boolean;
  partTemperatureC: number | null;
  material: string | null;
  alphaPerK: number | null;
  /** Corrected minus measured length, mm (negative for a warm part). */
  correction: number;
  note: string;
}

export function correctLength(length: number, partTemperatureC: number | undefined, material: Material | null): { value: number; correction: TemperatureCorrection } {
  if (partTemperatureC === undefined) {
    return { value: length, correction: { applied: false, partTemperatureC: null, material: material?.id ?? null, alphaPerK: material?.alphaPerK ?? null, correction: 0, note: 'no part temperature given: not corrected to 20 °C' } };
  }
  if (!material) {
    return { value: length, correction: { applied: false, partTemperatureC, material: null, alphaPerK: null, correction: 0, note: 'part material unknown: not corrected to 20 °C' } };
  }
  const value = length / (1 + material.alphaPerK * (partTemperatureC - REFERENCE_TEMPERATURE_C));
  return {
    value,
    correction: {
      applied: true, partTemperatureC, material: material.id, alphaPerK: material.alphaPerK, correction: value - length,
      note: `corrected to 20 °C from ${partTemperatureC} °C with α = ${(material.alphaPerK * 1e6).toFixed(1)} µm/(m·K) (${material.source})`,
    },
  };
}

/**
 * Capability and decisions against REFERENCES.md §7 and temperature against §8.
 */
import { describe, expect, it } from 'vitest';
import { decide } from '@/lib/capability/decision';
import { findMaterial } from '@/lib/capability/materials';
import { capability, falseAcceptRisk } from '@/lib/capability/risk';
import { correctLength } from '@/lib/capability/temperature';
import { adviseCapability } from '@/lib/evaluation/capability-advice';
import { planProgram } from '@/lib/features/plan';
import { planInputSchema } from '@/lib/features/plan-input';
import { demoBracket, demoProbe } from '@/lib/examples/demo-parts';
import { machinePreset } from '@/lib/kinematics/presets';

describe('TUR and the ISO 14253-1 default rule', () => {
  // Source: TUR = span/(2·U95) [published] ANSI/NCSL Z540.3 handbook via Morehouse; check values independently computed (REFERENCES.md §7).
  it('25 H7 with U 0.003: TUR 3.5 → send to the CMM; conformance zone 25.003–25.018', () => {
    const c = capability(0.021, 0.003);
    expect(c.tur).toBeCloseTo(3.5, 12);
    expect(c.advice).toBe('cmm');
    const d = decide(25.01, 25, 25.021, 0.003, 1);
    expect(d.decisionRule.conformanceZone?.[0]).toBeCloseTo(25.003, 12);
    expect(d.decisionRule.conformanceZone?.[1]).toBeCloseTo(25.018, 12);
    expect(d.decisionRule.nonconformanceBeyond[0]).toBeCloseTo(24.997, 12);
    expect(d.decisionRule.nonconformanceBeyond[1]).toBeCloseTo(25.024, 12);
    expect(d.status).toBe('conforming');
    expect(decide(25.0025, 25, 25.021, 0.003, 1).status).toBe('marginal');
    expect(decide(24.9965, 25, 25.021, 0.003, 1).status).toBe('nonconforming');
    expect(decide(25.0235, 25, 25.021, 0.003, 1).status).toBe('marginal');
    expect(decide(25.0245, 25, 25.021, 0.003, 1).status).toBe('nonconforming');
  });
  // Source: independently computed, REFERENCES.md §7: position ⌀0.05 with U 0.004 → accept ≤ 0.046, reject > 0.054.
  it('position ⌀0.05 with U 0.004: accept ≤ 0.046, reject > 0.054', () => {
    expect(decide(0.046, null, 0.05, 0.004, 1).status).toBe('conforming');
    expect(decide(0.0461, null, 0.05, 0.004, 1).status).toBe('marginal');
    expect(decide(0.054, null, 0.05, 0.004, 1).status).toBe('marginal');
    expect(decide(0.0541, null, 0.05, 0.004, 1).status).toBe('nonconforming');
  });
  it('warning share: conforming but past 80 % of the tolerance is marginal', () => {
    expect(decide(0.039, null, 0.05, 0.001).status).toBe('conforming');
    expect(decide(0.041, null, 0.05, 0.001).status).toBe('marginal');
    expect(decide(25.019, 25, 25.021, 0.0005).status).toBe('marginal');
    expect(decide(25.012, 25, 25.021, 0.0005).status).toBe('conforming');
  });
  it('U above half the tolerance: conformance can never be proven', () => {
    const d = decide(0.01, null, 0.01, 0.006, 1);
    expect(d.status).toBe('marginal');
    expect(decide(0.0, 0, 0.01, 0.006, 1).decisionRule.conformanceZone).toBeNull();
  });
  // Source: Z540.3 §5.3(b) [published, via Morehouse]: a TUR of 4:1 where the risk cannot be estimated.
  it('TUR exactly 4 is on-machine', () => {
    expect(capability(0.04, 0.005).advice).toBe('on-machine');
  });
});

describe('false-accept risk', () => {
  // Source: independently computed (JCGM 106 integrals), REFERENCES.md §7: TUR 4:1, 95 % of parts in tolerance → 0.86 %.
  it('TUR 4:1 with 95 % of parts in tolerance → 0.86 %', () => {
    const U = 2 / (2 * 4);
    const risk = falseAcceptRisk({ lower: -1, upper: 1, processMean: 0, processSigma: 1 / 1.959963985, u: U / 2 });
    expect(risk * 100).toBeCloseTo(0.86, 2);
  });
  it('guard banding by U lowers the risk', () => {
    const base = { lower: -1, upper: 1, processMean: 0, processSigma: 0.51, u: 0.125 };
    expect(falseAcceptRisk({ ...base, acceptLower: -0.75, acceptUpper: 0.75 })).toBeLessThan(falseAcceptRisk(base) / 3);
  });
});

describe('temperature correction to 20 °C', () => {
  // Source: α aluminium 23.1 µm/(m·K) [published] NIST (PMC8345254); 100 mm at 26 °C reads 0.01386 mm long [computed] (REFERENCES.md §8).
  it('100 mm aluminium measured at 26 °C reads 0.01386 mm long', () => {
    const al = findMaterial('Aluminum');
    expect(al?.alphaPerK).toBe(23.1e-6);
    const r = correctLength(100.01386, 26, al);
    expect(r.value).toBeCloseTo(100, 6);
    expect(r.correction.correction).toBeCloseTo(-0.01386, 5);
    expect(r.correction.applied).toBe(true);
  });
  // Source: α steel 11.5 µm/(m·K) [published] NIST (PMC8345254), REFERENCES.md §8.
  it('steel at 15 °C: a 50 mm length reads 2.875 µm short', () => {
    const r = correctLength(50 * (1 - 5 * 11.5e-6), 15, findMaterial('steel'));
    expect(r.value).toBeCloseTo(50, 7);
  });
  it('no temperature: not corrected, with a note', () => {
    const r = correctLength(10, undefined, findMaterial('steel'));
    expect(r.value).toBe(10);
    expect(r.correction.applied).toBe(false);
    expect(r.correction.note).toMatch(/no part temperature/);
  });
});

describe('capability advice per tolerance before machining', () => {
  // Source: TUR = span/(2U) and the 4:1 threshold [published] ANSI/NCSL Z540.3 via Morehouse (REFERENCES.md §7).
  it('the demo bracket on a 3-axis machine: TUR per tolerance from the planned points', async () => {
    const plan = planProgram(planInputSchema.parse({ part: demoBracket, probe: demoProbe, machine: machinePreset('3-axis') }));
    const conditions = { probeRepeatability2Sigma: 0.001, effectiveDiameterU: 0.001, machine: { aUm: 1.5, bMm: 500 }, partTemperatureC: 20 };
    const advice = adviseCapability(demoBracket, plan, conditions);
    expect(advice).toHaveLength(demoBracket.tolerances.length);
    for (const a of advice) {
      if (!a.capability || !a.budget || a.span === null) continue;
      expect(a.capability.tur).toBeCloseTo(a.span / (2 * a.budget.U), 12);
      expect(a.capability.advice).toBe(a.capability.tur >= 4 ? 'on-machine' : 'cmm');
    }
    const h7 = advice.find((a) => a.characteristic === 'diameter' && a.span !== null && Math.abs(a.span - 0.018) < 1e-12);
    expect(h7?.capability?.advice).toBeDefined();
    const unplanned = advice.find((a) => a.points === 0);
    expect(unplanned?.message).toMatch(/no planned touch points/);
  });
});

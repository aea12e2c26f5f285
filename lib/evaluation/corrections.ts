/**
 * Proposed corrections from a run: a work-offset shift from the datum features and
 * radius-wear updates from bore and boss (slot, web) size deviations, each with a dead
 * band (inside it: no change) and a cap (beyond it: nothing is written — stop and ask a
 * person). Emitted as absolute G10 lines in the dialect and as plain instructions; each
 * proposal names the measurement it came from.
 * Work offset: with the part frame placed in the machine by setup axes R, a datum frame
 * found at O_m instead of O_n moves the offset by R·(O_m − O_n). A rotation of the datum
 * frame is reported, never written (a G10 offset cannot hold it).
 * Wear: a bore measured d larger than the middle of its limits needs a tool that cuts
 * d/2 less on radius, so the radius wear grows by d/2 (the control then keeps the tool
 * farther from the wall); a boss the other way round.
 */
import type { Part } from '../features/schema';
import { add, cross, dot, normalize, reject, scale, sub, type Vec3 } from '../geometry/vec3';
import { buildFrame, measuredDatum, nominalDatum } from './datum-frame';
import type { EvalContext } from './context';
import { CORRECTION_DIALECTS, fillTemplate, formatNumber, registerName, type CorrectionDialect } from './correction-dialects';
import type { ResultRecord } from './evaluate';
import type { CorrectionSettings } from './input';

export type ProposalState = 'apply' | 'within-dead-band' | 'stop-ask-a-person' | 'not-available';

export interface Source { featureUuids: string[]; toleranceUuid?: string; touchPointUuids: string[] }

export interface WorkOffsetProposal {
  kind: 'work-offset';
  register: number;
  registerName: string;
  state: ProposalState;
  old: Vec3;
  new: Vec3;
  shift: Vec3;
  rotationDeg: number;
  line: string | null;
  instruction: string;
  source: Source;
}

export interface WearProposal {
  kind: 'radius-wear';
  tool: number;
  featureUuid: string;
  state: ProposalState;
  old: number;
  new: number;
  change: number;
  line: string | null;
  instruction: string;
  source: Source;
}

export interface Corrections { dialect: string; proposals: Array<WorkOffsetProposal | WearProposal>; lines: string[]; note: string }

export function proposeCorrections(ctx: EvalContext, results: ResultRecord[], settings: CorrectionSettings): Corrections {
  const dialect = CORRECTION_DIALECTS[settings.dialect];
  if (!dialect) {
    return { dialect: settings.dialect, proposals: [], lines: [], note: `dialect "${settings.dialect}" has no offset format: known are ${Object.keys(CORRECTION_DIALECTS).join(', ')}` };
  }
  const proposals: Array<WorkOffsetProposal | WearProposal> = [];
  if (settings.workOffset) proposals.push(workOffset(ctx, settings.workOffset, dialect));
  for (const w of settings.wear) proposals.push(wear(results, w, ctx.part, dialect));
  return {
    dialect: dialect.id, proposals,
    lines: proposals.flatMap((p) => (p.state === 'apply' && p.line ? [p.line] : [])),
    note: 'Check every value before entering it; prove the next part out at reduced override. Follow the machine builder\'s instructions and local rules.',
  };
}

type WorkSettings = NonNullable<CorrectionSettings['workOffset']>;

function workOffset(ctx: EvalContext, s: WorkSettings, d: CorrectionDialect): WorkOffsetProposal {
  const letters = Object.keys(ctx.part.datums).sort().slice(0, 3);
  const base = { kind: 'work-offset' as const, register: s.register, registerName: registerName(s.register), old: s.current, new: s.current, shift: [0, 0, 0] as Vec3, rotationDeg: 0, line: null };
  const nominal = [];
  const measured = [];
  const featureUuids: string[] = [];
  const touchPointUuids: string[] = [];
  for (const l of letters) {
    const m = ctx.byFeature.get(ctx.part.datums[l] as string);
    if (!m || !m.ok) {
      return { ...base, state: 'not-available', instruction: `no work-offset proposal: datum ${l} was not measured`, source: { featureUuids, touchPointUuids } };
    }
    nominal.push(nominalDatum(m.m.feature));
    measured.push(measuredDatum(m.m.element));
    featureUuids.push(m.m.feature.uuid);
    touchPointUuids.push(...m.m.points.map((p) => p.tp.uuid));
  }
  if (letters.length === 0) return { ...base, state: 'not-available', instruction: 'no work-offset proposal: the part has no datums', source: { featureUuids, touchPointUuids } };
  const fn = buildFrame(nominal);
  const fm = buildFrame(measured);
  const zAxis = normalize(s.zAxis ?? [0, 0, 1]);
  const xAxis = normalize(reject(s.xAxis ?? [1, 0, 0], zAxis));
  const yAxis = cross(zAxis, xAxis);
  const dP = sub(fm.origin, fn.origin);
  const shiftRaw: Vec3 = add(add(scale(xAxis, dP[0]), scale(yAxis, dP[1])), scale(zAxis, dP[2]));
  const rotationDeg = (Math.atan2(dot(cross(fn.x, fm.x), fn.z), dot(fn.x, fm.x)) * 180) / Math.PI;
  const shift = shiftRaw.map((v) => (Math.abs(v) <= s.deadBand ? 0 : v)) as Vec3;
  const source = { featureUuids, touchPointUuids };
  const f = (v: number): string => formatNumber(v, d.decimals);
  const rot = Math.abs(rotationDeg) > 1e-4 ? `; the datum frame is also turned ${rotationDeg.toFixed(4)}° about its primary axis — not in the offset: re-align the part if that matters` : '';
  if (shiftRaw.some((v) => Math.abs(v) > s.cap)) {
    return { ...base, shift: shiftRaw, rotationDeg, state: 'stop-ask-a-person', source,
      instruction: `STOP — work offset ${registerName(s.register)} would move by X ${f(shiftRaw[0])} Y ${f(shiftRaw[1])} Z ${f(shiftRaw[2])} mm, beyond the cap of ${s.cap} mm: nothing written; ask a person to check the setup${rot}` };
  }
  if (shift.every((v) => v === 0)) {
    return { ...base, shift, rotationDeg, state: 'within-dead-band', source, instruction: `work offset ${registerName(s.register)}: no change (every shift inside the dead band of ${s.deadBand} mm)${rot}` };
  }
  const next = add(s.current, shift);
  return {
    ...base, new: next, shift, rotationDeg, state: 'apply', source,
    line: fillTemplate(d.workOffset, { register: String(s.register), x: f(next[0]), y: f(next[1]), z: f(next[2]) }),
    instruction: `work offset ${registerName(s.register)}: X ${f(s.current[0])} → ${f(next[0])}, Y ${f(s.current[1])} → ${f(next[1])}, Z ${f(s.current[2])} → ${f(next[2])} (shift ${f(shift[0])}, ${f(shift[1])}, ${f(shift[2])} mm from datums ${letters.join('|')})${rot}`,
  };
}

type WearSettings = CorrectionSettings['wear'][number];

function wear(results: ResultRecord[], w: WearSettings, part: Part, d: CorrectionDialect): WearProposal {
  const f = (v: number): string => formatNumber(v, d.decimals);
  const feature = part.features.find((x) => x.uuid === w.featureUuid);
  const size = results.find((r) => r.featureUuid === w.featureUuid && (r.characteristic === 'diameter' || r.characteristic === 'width'));
  const base = { kind: 'radius-wear' as const, tool: w.tool, featureUuid: w.featureUuid, old: w.current, new: w.current, change: 0, line: null };
  const source: Source = { featureUuids: [w.featureUuid], toleranceUuid: size?.toleranceUuid, touchPointUuids: size?.touchPointUuids ?? [] };
  if (!feature || !size || size.value === null || size.lower === null || size.upper === null) {
    return { ...base, state: 'not-available', source, instruction: `tool ${w.tool}: no wear proposal — ${feature?.label ?? w.featureUuid} has no evaluated size` };
  }
  const internal = feature.type === 'bore' || feature.type === 'slot';
  const target = (size.lower + size.upper) / 2;
  const dev = size.value - target;
  const change = internal ? dev / 2 : -dev / 2;
  const what = `${feature.label} ${size.characteristic} ${f(size.value)} vs middle of limits ${f(target)} (${dev >= 0 ? '+' : ''}${f(dev)} mm)`;
  if (Math.abs(change) > w.cap) {
    return { ...base, change, state: 'stop-ask-a-person', source, instruction: `STOP — tool ${w.tool} radius wear would change by ${f(change)} mm, beyond the cap of ${w.cap} mm: nothing written; ask a person (${what})` };
  }
  if (Math.abs(change) <= w.deadBand) {
    return { ...base, change, state: 'within-dead-band', source, instruction: `tool ${w.tool}: no change, ${f(change)} mm is inside the dead band of ${w.deadBand} mm (${what})` };
  }
  const next = w.current + change;
  return {
    ...base, new: next, change, state: 'apply', source,
    line: fillTemplate(d.radiusWear, { tool: String(w.tool), value: f(next) }),
    instruction: `tool ${w.tool} ${d.radiusNote}: ${f(w.current)} → ${f(next)} (${change >= 0 ? '+' : ''}${f(change)} mm; ${what})`,
  };
}

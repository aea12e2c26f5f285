/**
 * The logic-free view model a post's templates render: every number already formatted,
 * every comment already cleaned and wrapped. One block per neutral step; `kind` names the
 * partial that renders it.
 */
import type { Part, Probe } from '../features/schema';
import type { AxisValues, Machine } from '../kinematics/schema';
import { SAFETY_CAUTIONS, SAFETY_HEADLINE } from '../packaging/cautions';
import { commentLines, fixed } from './format';
import type { PostDefinition } from './postprocessor-schema';
import type { NeutralProgram, Step } from './steps';

export interface Block {
  kind: Step['kind'];
  words?: string;
  feed?: string;
  x?: string;
  y?: string;
  z?: string;
  record?: string;
  comment?: string;
}

export interface ProgramView {
  programStart: string[];
  header: string[];
  safeStart: string[];
  probeOn: string[];
  tripOpen: string[];
  blocks: Block[];
  tripClose: string[];
  probeOff: string[];
  programEnd: string[];
  stopMiss: string[];
  stopHit: string[];
  vars: Record<string, string>;
  skipTol: string;
}

/** The caution every program carries (DESIGN.md, "Safety"); the verifier looks for these phrases. */
export const CAUTION_PHRASES = ['SINGLE BLOCK', 'OVERRIDE', 'CLEARANCE', "MACHINE BUILDER'S INSTRUCTIONS"] as const;

export const PROGRAM_REVISION_PLACEHOLDER = '----';

const fill = (template: string, values: Record<string, string>): string =>
  template.replace(/\{(\w+)\}/g, (m, k: string) => values[k] ?? m);

function header(def: PostDefinition, part: Part, probe: Probe, machine: Machine, prog: NeutralProgram): string[] {
  const rot = machine.rotaries.map((r) => `${r.name} ${r.carrier} ${r.min === null ? 'continuous' : `${r.min} to ${r.max} deg`}`).join(', ');
  const texts = [
    'Probity probing program - generated; verify again after any hand edit',
    `Part ${part.number ?? 'unnumbered'}  drawing rev ${part.revision ?? '-'}  program rev ${PROGRAM_REVISION_PLACEHOLDER}`,
    `Machine ${machine.name}${rot ? ` - rotaries ${rot}` : ' - 3-axis'}`,
    `Probe ball D${probe.stylusDiameter} effective D${probe.effectiveDiameter ?? probe.stylusDiameter}  approach ${probe.approach}  overtravel ${probe.overtravel}  clearance ${probe.clearance}  feeds ${probe.fastFeed}/${probe.measureFeed} mm/min`,
    `Post ${def.id} - ${def.name}`,
    'Units mm. The active work offset must be the machine model origin. Rotaries move only with Z at the top of its travel.',
    `Features ${prog.features}  touch points ${prog.touchPoints}`,
    `${SAFETY_HEADLINE}:`,
    ...SAFETY_CAUTIONS,
    'Reduce rapid and feed override for the first run and check clearance of every approach.',
  ];
  return texts.flatMap((t) => commentLines(t, def));
}

export function buildView(def: PostDefinition, prog: NeutralProgram, part: Part, probe: Probe, machine: Machine): ProgramView {
  const dl = def.decimals.linear;
  const da = def.decimals.angular;
  const program = (part.number ?? 'program').replace(/[^A-Za-z0-9-]/g, '');
  const lin = (a: AxisValues): string => {
    let s = '';
    if (a.X !== undefined) s += `X${fixed(a.X, dl)}`;
    if (a.Y !== undefined) s += `${s ? ' ' : ''}Y${fixed(a.Y, dl)}`;
    if (a.Z !== undefined) s += `${s ? ' ' : ''}Z${fixed(a.Z, dl)}`;
    return s;
  };
  const rot = (a: AxisValues): string => prog.rotaryNames.map((n) => `${n}${fixed(a[n] ?? 0, da)}`).join(' ');
  const words = ['X', 'Y', 'Z', ...prog.rotaryNames];
  const values = words.map((w) => fill(def.trip.value, { word: w, var: def.trip.variables[w] ?? '#0' })).join(def.trip.separator);
  let lastFeed = NaN;
  const feed = (f: number): string => {
    if (!def.repeatFeed && f === lastFeed) return '';
    lastFeed = f;
    return ` F${fixed(f, def.decimals.feed)}`;
  };
  const blocks = prog.steps.map((s): Block => {
    switch (s.kind) {
      case 'feature': return { kind: s.kind, comment: commentLines(`Feature ${s.label} ${s.type}, ${s.points} points`, def)[0] };
      case 'rapid': return { kind: s.kind, words: lin(s.to) };
      case 'rotary': return { kind: s.kind, words: rot(s.to) };
      case 'backoff': return { kind: s.kind, words: lin(s.by), feed: feed(s.feed) };
      case 'record': {
        const uuid = def.trip.uuidCase === 'upper' ? s.uuid.toUpperCase() : s.uuid;
        return { kind: s.kind, record: fill(def.trip.record, { uuid, values }) };
      }
      default: {
        const x = fixed(s.to.X ?? 0, dl);
        const y = fixed(s.to.Y ?? 0, dl);
        const z = fixed(s.to.Z ?? 0, dl);
        return { kind: s.kind, words: `X${x} Y${y} Z${z}`, feed: feed(s.feed), x, y, z };
      }
    }
  });
  return {
    programStart: def.programStart.map((l) => fill(l, { program })),
    header: header(def, part, probe, machine, prog),
    safeStart: def.safeStart,
    probeOn: def.probeOn,
    tripOpen: def.trip.open.map((l) => fill(l, { program })),
    blocks,
    tripClose: def.trip.close,
    probeOff: def.probeOff,
    programEnd: def.programEnd,
    stopMiss: def.stops.miss,
    stopHit: def.stops.hit,
    vars: def.trip.variables,
    skipTol: fixed(def.skipTolerance, dl),
  };
}

/**
 * The logic-free view model a post's templates render: every number already formatted,
 * every comment already cleaned and wrapped. One block per neutral step; `kind` names the
 * partial that renders it.
 */
import type { Part, Probe } from '../features/schema';
import type { Vec3 } from '../geometry/vec3';
import type { AxisValues, Machine } from '../kinematics/schema';
import { SAFETY_CAUTIONS, SAFETY_HEADLINE } from '../packaging/cautions';
import { commentLines, fixed } from './format';
import type { PostDefinition } from './postprocessor-schema';
import type { NeutralProgram, Step } from './steps';

/** Every field is present (empty when a kind has no use for it), so all blocks share one shape. */
export interface Block {
  kind: Step['kind'];
  words: string;
  feed: string;
  x: string;
  y: string;
  z: string;
  record: string;
  comment: string;
}

const block = (kind: Step['kind'], words: string, feed = '', x = '', y = '', z = '', record = '', comment = ''): Block =>
  ({ kind, words, feed, x, y, z, record, comment });

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
  const feedText = new Map<number, string>();
  const feed = (f: number): string => {
    if (!def.repeatFeed && f === lastFeed) return '';
    lastFeed = f;
    let t = feedText.get(f);
    if (t === undefined) feedText.set(f, (t = ` F${fixed(f, def.decimals.feed)}`));
    return t;
  };
  // the record statement split at its uuid, with the trip values filled in once
  const recordParts = def.trip.record.split('{uuid}').map((p) => fill(p, { values }));
  // steps share their target objects (a touch's end for both passes, a start for its
  // retract): the last two targets are formatted once
  type Words = { to: Vec3 | null; words: string; x: string; y: string; z: string };
  let recent: Words = { to: null, words: '', x: '', y: '', z: '' };
  let older: Words = recent;
  const target = (to: Vec3): Words => {
    if (to === recent.to) return recent;
    if (to !== older.to) {
      const x = fixed(to[0], dl);
      const y = fixed(to[1], dl);
      const z = fixed(to[2], dl);
      older = { to, words: `X${x} Y${y} Z${z}`, x, y, z };
    }
    [recent, older] = [older, recent];
    return recent;
  };
  const blocks = prog.steps.map((s): Block => {
    switch (s.kind) {
      case 'feature': return block(s.kind, '', '', '', '', '', '', commentLines(`Feature ${s.label} ${s.type}, ${s.points} points`, def)[0]);
      case 'rapid': return block(s.kind, lin(s.to));
      case 'rotary': return block(s.kind, rot(s.to));
      case 'backoff': return block(s.kind, `X${fixed(s.by[0], dl)} Y${fixed(s.by[1], dl)} Z${fixed(s.by[2], dl)}`, feed(s.feed));
      case 'record': return block(s.kind, '', '', '', '', '', recordParts.join(def.trip.uuidCase === 'upper' ? s.uuid.toUpperCase() : s.uuid));
      default: {
        const w = target(s.to);
        return block(s.kind, w.words, feed(s.feed), w.x, w.y, w.z);
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

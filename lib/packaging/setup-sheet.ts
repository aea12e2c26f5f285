/**
 * The printable setup sheet (`setup-sheet.html`): part, machine and version, probe and its
 * calibration state, the work offset to set and how, the features by balloon label, and the
 * safety cautions. TypeScript builds a fully formatted view model; the handlebars template
 * only loops and interpolates (and escapes), on an isolated Handlebars instance.
 */
import Handlebars from 'handlebars';
import { SAFETY_CAUTIONS, SAFETY_HEADLINE } from './cautions';
import { byLabel, describeFeature, describeTolerance, isoToText, mm, vec } from './describe';
import type { PackageInput } from './package-input';

export interface SetupSheetView {
  title: string;
  cautionHeadline: string;
  cautions: readonly string[];
  facts: { name: string; value: string }[];
  calibrationWarning: string | null;
  workOffset: { word: string; steps: string[] };
  features: { label: string; description: string; points: number; tolerances: string }[];
  programFile: string;
  programSha256: string;
}

const CALIBRATION_WORDS = {
  current: 'calibrated',
  stale: 'calibration out of date',
  none: 'never calibrated',
} as const;

function calibrationText(p: PackageInput['probe']): string {
  const when = p.calibration.calibratedAt ? `, last ${isoToText(p.calibration.calibratedAt)}` : '';
  const note = p.calibration.note ? ` (${p.calibration.note})` : '';
  return `${CALIBRATION_WORDS[p.calibration.state]}${when}${note}`;
}

function workOffsetSteps(input: PackageInput): string[] {
  const { model } = input.machine;
  const w = input.program.workOffset;
  const rotaries = model.rotaries.map((r) => `${r.name} (${r.carrier})`).join(', ');
  const steps = [
    `The program is written in the machine model's frame: set ${w} to the model origin of "${input.machine.name}" version ${input.machine.versionNumber}, as recorded by the engineer.`,
  ];
  if (rotaries) steps.push(`Bring every rotary to 0 before the check: ${rotaries}.`);
  steps.push(
    `With the rotaries at 0 the part datum origin must read ${vec(model.setup.origin)} in ${w}, part X along ${vec(model.setup.xAxis)} and part Z along ${vec(model.setup.zAxis)}.`,
    `Touch off the datum origin and compare. If it differs by more than the tightest tolerance below, stop: the setup or the machine record is wrong — ask the engineer before running.`,
  );
  return steps;
}

export function setupSheetView(input: PackageInput, programFile: string, programSha256: string): SetupSheetView {
  const pointsPerFeature = new Map<string, number>();
  for (const tp of input.plan.touchPoints) pointsPerFeature.set(tp.featureUuid, (pointsPerFeature.get(tp.featureUuid) ?? 0) + 1);
  const { part, machine, probe, program, revision, approval } = input;
  return {
    title: `Setup sheet — ${part.number}${part.revision ? ` rev ${part.revision}` : ''}, ${program.name} revision ${revision.number}`,
    cautionHeadline: SAFETY_HEADLINE,
    cautions: SAFETY_CAUTIONS,
    facts: [
      { name: 'Part', value: [part.number, part.name, part.revision ? `rev ${part.revision}` : undefined].filter(Boolean).join(' — ') },
      { name: 'Material', value: part.material ?? 'not stated' },
      { name: 'Program', value: `${program.name}, revision ${revision.number} (${program.postprocessorName})` },
      { name: 'Machine', value: `${machine.name}, version ${machine.versionNumber}` },
      { name: 'Probe', value: `${probe.name}: stylus ⌀${mm(probe.stylusDiameter)}, effective ⌀${mm(probe.effectiveDiameter)}` },
      { name: 'Calibration', value: calibrationText(probe) },
      { name: 'Approved', value: `${approval.approverName}, ${isoToText(approval.approvedAt)}` },
      { name: 'Touch points', value: String(input.plan.touchPoints.length) },
      { name: 'Package built', value: isoToText(input.generatedAt) },
    ],
    calibrationWarning: probe.calibration.state === 'current'
      ? null
      : `The probe is ${CALIBRATION_WORDS[probe.calibration.state]}. Calibrate it before running: results from an uncalibrated probe are not evidence of conformance.`,
    workOffset: { word: program.workOffset, steps: workOffsetSteps(input) },
    features: byLabel(part.features).map((f) => ({
      label: f.label,
      description: describeFeature(f),
      points: pointsPerFeature.get(f.uuid) ?? 0,
      tolerances: part.tolerances.filter((t) => t.featureUuid === f.uuid).map(describeTolerance).join('; ') || '—',
    })),
    programFile,
    programSha256,
  };
}

const TEMPLATE = `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><title>{{title}}</title>
<style>
body{font:11pt/1.4 system-ui,sans-serif;margin:16mm;color:#111}
h1{font-size:15pt;margin:0 0 8pt} h2{font-size:12pt;margin:14pt 0 4pt}
.caution{border:2.5pt solid #111;padding:6pt 10pt;margin:0 0 10pt}
.caution strong{font-size:12pt} .warn{border:1.5pt dashed #111;padding:4pt 8pt;font-weight:600}
table{border-collapse:collapse;width:100%} th,td{border:0.75pt solid #777;padding:3pt 5pt;text-align:left;vertical-align:top}
th{background:#eee} code{font-family:ui-monospace,monospace;font-size:9pt;word-break:break-all}
@media print{body{margin:10mm}}
</style></head><body>
<h1>{{title}}</h1>
<section class="caution" aria-label="Safety"><strong>⚠ {{cautionHeadline}}</strong>
<ul>{{#each cautions}}<li>{{this}}</li>{{/each}}</ul></section>
{{#if calibrationWarning}}<p class="warn">{{calibrationWarning}}</p>{{/if}}
<table><tbody>{{#each facts}}<tr><th scope="row">{{name}}</th><td>{{value}}</td></tr>{{/each}}</tbody></table>
<h2>Work offset {{workOffset.word}}</h2>
<ol>{{#each workOffset.steps}}<li>{{this}}</li>{{/each}}</ol>
<h2>Features by balloon</h2>
<table><thead><tr><th>Balloon</th><th>Feature</th><th>Points</th><th>Tolerances</th></tr></thead>
<tbody>{{#each features}}<tr><td>{{label}}</td><td>{{description}}</td><td>{{points}}</td><td>{{tolerances}}</td></tr>{{/each}}</tbody></table>
<h2>Program file</h2>
<p>Load <code>{{programFile}}</code> and check its SHA-256 before running:<br><code>{{programSha256}}</code></p>
</body></html>
`;

// Handlebars compiles lazily on the first call; the instance carries no helpers.
const template = Handlebars.create().compile<SetupSheetView>(TEMPLATE, { strict: true });

export function renderSetupSheet(view: SetupSheetView): string {
  return template(view);
}

'use client';
/**
 * The machine in 3D: the tip's linear travel box, each rotary's line with an
 * arrow along its direction and an arc showing its positive sense (right-hand
 * rule), and the part frame where `setup` puts it. Load through lazy-views.tsx.
 */
import { useMemo } from 'react';
import { Canvas } from '@react-three/fiber';
import type { Machine, Vec3 } from '@/lib/kinematics/schema';
import { add, boundsCenter, machineScene, scale, senseArc } from './scene-data';
import { Arrow, BoxEdges, Controls, FrameAxes, Label, Polyline } from './primitives';

export type MachineViewProps = { machine: Machine; height?: number };

function RotaryAxis({ name, color, point, direction, size }: { name: string; color: string; point: Vec3; direction: Vec3; size: number }) {
  const half = size * 0.35;
  const from = add(point, scale(direction, -half));
  const to = add(point, scale(direction, half));
  const arcAt = add(point, scale(direction, half * 0.8));
  const arc = useMemo(() => senseArc(arcAt, direction, size * 0.05), [arcAt, direction, size]);
  const arcEnd = arc.points[arc.points.length - 1] ?? arcAt;
  return (
    <group>
      <Polyline points={[from, point]} color={color} />
      <Arrow from={point} to={to} color={color} head={0.12} />
      <Polyline points={arc.points} color={color} />
      <Arrow from={arcEnd} to={add(arcEnd, scale(arc.endTangent, size * 0.03))} color={color} head={0.9} />
      <Label text={name} at={add(to, scale(direction, size * 0.04))} size={size * 0.04} color={color} />
    </group>
  );
}

export default function MachineView({ machine, height = 420 }: MachineViewProps) {
  const scene = useMemo(() => machineScene(machine), [machine]);
  const center = useMemo(() => boundsCenter(scene.travel), [scene]);
  const s = scene.size;
  const camera = { position: add(center, [s * 0.8, -s * 1.1, s * 0.7]) as Vec3, up: [0, 0, 1] as Vec3, near: s / 1000, far: s * 20, fov: 40 };
  return (
    <figure className="flex flex-col gap-2 lg:flex-row">
      <div className="min-w-0 flex-1 rounded border border-slate-300 bg-white" style={{ height }} data-testid="machine-view">
        <Canvas frameloop="demand" camera={camera} dpr={[1, 1.5]} aria-label={`3D view of ${machine.name}`}>
          <Controls target={center} />
          <BoxEdges bounds={scene.travel} color="#94a3b8" />
          <FrameAxes origin={[0, 0, 0]} x={[1, 0, 0]} y={[0, 1, 0]} z={[0, 0, 1]} size={s * 0.12} prefix="M" />
          <FrameAxes {...scene.partFrame} size={s * 0.07} prefix="P" />
          {scene.rotaries.map((r) => <RotaryAxis key={r.name} {...r} size={s} />)}
          <Label text="tip" at={scene.headAt} size={s * 0.03} />
        </Canvas>
      </div>
      <figcaption className="w-full text-sm lg:w-64">
        <p className="mb-1 font-medium">Legend</p>
        <ul className="space-y-1">
          <li><span aria-hidden className="mr-2 inline-block h-0.5 w-6 bg-slate-400 align-middle" />Linear travel of the tip</li>
          <li>MX, MY, MZ — machine frame; PX, PY, PZ — part frame at the set-up origin</li>
          {scene.rotaries.map((r) => (
            <li key={r.name}>
              <span aria-hidden className="mr-2 inline-block h-3 w-3 rounded-full align-middle" style={{ background: r.color }} />
              <strong>{r.name}</strong> on the {r.carrier}, {r.limits}; the arc shows the positive turn
            </li>
          ))}
        </ul>
      </figcaption>
    </figure>
  );
}

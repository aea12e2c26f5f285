'use client';
/**
 * A part in 3D: each feature's nominal shape and, after planning, every touch
 * point (a dot on the surface, an arrow from start to nominal contact: the
 * approach direction), coloured by feature, with a legend and the touch-point
 * table beside it. Load through lazy-views.tsx.
 */
import { useMemo, useState } from 'react';
import { Canvas } from '@react-three/fiber';
import type { Feature } from '@/lib/features/schema';
import type { TouchPoint } from '@/lib/program/plan-schema';
import type { Vec3 } from '@/lib/kinematics/schema';
import { add, boundsCenter, boundsSize, featureColors, partBounds } from './scene-data';
import { Arrow, Controls, FrameAxes } from './primitives';
import { FeatureShape } from './feature-shapes';

export type PartViewProps = { features: readonly Feature[]; touchPoints?: readonly TouchPoint[]; height?: number };

const pageSize = 25;
const fmt = (v: readonly number[]) => v.map((n) => n.toFixed(3)).join(', ');

/** Above this many points only every n-th is drawn (the table lists them all), to keep the view responsive. */
const maxDrawn = 1500;

function TouchPointMarks({ points, colorOf, size }: { points: readonly TouchPoint[]; colorOf: Map<string, string>; size: number }) {
  const step = Math.max(1, Math.ceil(points.length / maxDrawn));
  return (
    <group>
      {points.filter((_, i) => i % step === 0).map((t) => {
        const color = colorOf.get(t.featureUuid) ?? '#999999';
        return (
          <group key={t.uuid}>
            <mesh position={t.surface}><sphereGeometry args={[size * 0.006, 10, 6]} /><meshBasicMaterial color={color} /></mesh>
            <Arrow from={t.start} to={t.target} color={color} head={0.35} />
          </group>
        );
      })}
    </group>
  );
}

function TouchPointTable({ points, labelOf, colorOf }: { points: readonly TouchPoint[]; labelOf: Map<string, string>; colorOf: Map<string, string> }) {
  const [page, setPage] = useState(0);
  const pages = Math.max(1, Math.ceil(points.length / pageSize));
  const shown = points.slice(page * pageSize, page * pageSize + pageSize);
  if (points.length === 0) return <p className="text-sm text-slate-600">No touch points yet: plan or generate a program to see them.</p>;
  return (
    <div className="text-xs">
      <table className="w-full border-collapse" aria-label="Touch points">
        <thead><tr className="border-b text-left"><th className="py-1 pr-2">#</th><th className="pr-2">Feature</th><th className="pr-2">Surface (mm)</th><th>Direction</th></tr></thead>
        <tbody>
          {shown.map((t) => (
            <tr key={t.uuid} className="border-b border-slate-100">
              <td className="py-0.5 pr-2 tabular-nums">{t.seq + 1}</td>
              <td className="pr-2"><span aria-hidden className="mr-1 inline-block h-2 w-2 rounded-full" style={{ background: colorOf.get(t.featureUuid) }} />{labelOf.get(t.featureUuid) ?? '?'}</td>
              <td className="pr-2 font-mono tabular-nums">{fmt(t.surface)}</td>
              <td className="font-mono tabular-nums">{fmt(t.direction)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <div className="mt-1 flex items-center gap-2">
        <button type="button" className="rounded border px-2 py-0.5 disabled:opacity-40" disabled={page === 0} onClick={() => setPage(page - 1)}>Previous</button>
        <span>Page {page + 1} of {pages} · {points.length} points</span>
        <button type="button" className="rounded border px-2 py-0.5 disabled:opacity-40" disabled={page + 1 >= pages} onClick={() => setPage(page + 1)}>Next</button>
      </div>
    </div>
  );
}

export default function PartView({ features, touchPoints = [], height = 420 }: PartViewProps) {
  const colors = useMemo(() => featureColors(features), [features]);
  const colorOf = useMemo(() => new Map(colors.map((c) => [c.uuid, c.color])), [colors]);
  const labelOf = useMemo(() => new Map(colors.map((c) => [c.uuid, c.label])), [colors]);
  const bounds = useMemo(() => partBounds(features, touchPoints), [features, touchPoints]);
  const center = useMemo(() => boundsCenter(bounds), [bounds]);
  const s = boundsSize(bounds);
  const countOf = useMemo(() => {
    const m = new Map<string, number>();
    for (const t of touchPoints) m.set(t.featureUuid, (m.get(t.featureUuid) ?? 0) + 1);
    return m;
  }, [touchPoints]);
  const camera = { position: add(center, [s * 0.9, -s * 1.2, s * 0.9]) as Vec3, up: [0, 0, 1] as Vec3, near: s / 1000, far: s * 20, fov: 40 };
  return (
    <figure className="grid gap-3 lg:grid-cols-[minmax(0,1fr)_22rem]">
      <div className="rounded border border-slate-300 bg-white" style={{ height }} data-testid="part-view" data-touch-points={touchPoints.length}>
        <Canvas frameloop="demand" camera={camera} dpr={[1, 1.5]} aria-label="3D view of the part">
          <ambientLight intensity={0.8} />
          <directionalLight position={[1, -1, 2]} intensity={1.2} />
          <Controls target={center} />
          <FrameAxes origin={[0, 0, 0]} x={[1, 0, 0]} y={[0, 1, 0]} z={[0, 0, 1]} size={s * 0.15} />
          {features.map((f) => <FeatureShape key={f.uuid} feature={f} color={colorOf.get(f.uuid) ?? '#999999'} />)}
          <TouchPointMarks points={touchPoints} colorOf={colorOf} size={s} />
        </Canvas>
      </div>
      <figcaption className="space-y-3">
        <div>
          <p className="mb-1 text-sm font-medium">Features</p>
          <ul className="space-y-0.5 text-sm" aria-label="Feature colours">
            {colors.map((c) => (
              <li key={c.uuid}>
                <span aria-hidden className="mr-2 inline-block h-3 w-3 rounded-sm align-middle" style={{ background: c.color }} />
                <strong>{c.label}</strong> {c.type}{countOf.size > 0 ? ` · ${countOf.get(c.uuid) ?? 0} points` : ''}
              </li>
            ))}
          </ul>
          <p className="mt-1 text-xs text-slate-600">Arrows run from each touch point&apos;s start to its nominal contact: the approach direction.{touchPoints.length > maxDrawn ? ` Every ${Math.ceil(touchPoints.length / maxDrawn)}th of ${touchPoints.length} points is drawn.` : ''}</p>
        </div>
        <TouchPointTable points={touchPoints} labelOf={labelOf} colorOf={colorOf} />
      </figcaption>
    </figure>
  );
}

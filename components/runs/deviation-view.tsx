'use client';
/**
 * Measured points in 3D beside the nominal features, each coloured by its deviation
 * along the nominal normal (stylus-ball centre minus nominal target): blue inside the
 * material, orange outside, grey near zero, with the scale as numbers. Load through
 * lazy-deviation-view.tsx.
 */
import { Canvas } from '@react-three/fiber';
import { useMemo } from 'react';
import { FeatureShape } from '@/components/three/feature-shapes';
import { Controls, FrameAxes } from '@/components/three/primitives';
import { add, boundsCenter, boundsSize, partBounds } from '@/components/three/scene-data';
import type { Feature } from '@/lib/features/schema';
import type { Vec3 } from '@/lib/kinematics/schema';
import type { TouchPoint } from '@/lib/program/plan-schema';

export interface DeviationPoint { uuid: string; point: Vec3; deviation: number }
export interface DeviationViewProps { features: Feature[]; touchPoints: TouchPoint[]; points: DeviationPoint[]; height?: number }

// Okabe–Ito blue, grey, orange.
const NEG = [0x00, 0x72, 0xb2];
const MID = [0x99, 0x99, 0x99];
const POS = [0xd5, 0x5e, 0x00];

function colourFor(d: number, scale: number): string {
  const t = Math.max(-1, Math.min(1, scale > 0 ? d / scale : 0));
  const end = t < 0 ? NEG : POS;
  const k = Math.abs(t);
  const c = MID.map((m, i) => Math.round(m + ((end[i] ?? m) - m) * k));
  return `rgb(${c.join(',')})`;
}

export default function DeviationView({ features, touchPoints, points, height = 380 }: DeviationViewProps) {
  const bounds = useMemo(() => partBounds(features, touchPoints), [features, touchPoints]);
  const center = useMemo(() => boundsCenter(bounds), [bounds]);
  const s = boundsSize(bounds);
  const scale = Math.max(1e-3, ...points.map((p) => Math.abs(p.deviation)));
  const camera = { position: add(center, [s * 0.9, -s * 1.2, s * 0.9]) as Vec3, up: [0, 0, 1] as Vec3, near: s / 1000, far: s * 20, fov: 40 };
  return (
    <figure className="space-y-2">
      <div className="rounded-card border border-line bg-surface" style={{ height }} data-testid="deviation-view" data-points={points.length}>
        <Canvas frameloop="demand" camera={camera} dpr={[1, 1.5]} aria-label="3D view of measured points coloured by deviation">
          <ambientLight intensity={0.8} />
          <directionalLight position={[1, -1, 2]} intensity={1.2} />
          <Controls target={center} />
          <FrameAxes origin={[0, 0, 0]} x={[1, 0, 0]} y={[0, 1, 0]} z={[0, 0, 1]} size={s * 0.15} />
          {features.map((f) => <FeatureShape key={f.uuid} feature={f} color="#C9CEC4" />)}
          {points.map((p) => (
            <mesh key={p.uuid} position={p.point}><sphereGeometry args={[s * 0.009, 12, 8]} /><meshBasicMaterial color={colourFor(p.deviation, scale)} /></mesh>
          ))}
        </Canvas>
      </div>
      <figcaption className="flex flex-wrap items-center gap-3 text-caption text-ink-muted">
        <span>Deviation along the nominal normal:</span>
        <span><span aria-hidden className="mr-1 inline-block h-3 w-3 rounded-full align-middle" style={{ background: colourFor(-scale, scale) }} />−{scale.toFixed(4)} mm (into the material)</span>
        <span><span aria-hidden className="mr-1 inline-block h-3 w-3 rounded-full align-middle" style={{ background: colourFor(0, scale) }} />0</span>
        <span><span aria-hidden className="mr-1 inline-block h-3 w-3 rounded-full align-middle" style={{ background: colourFor(scale, scale) }} />+{scale.toFixed(4)} mm (out of the material)</span>
      </figcaption>
    </figure>
  );
}

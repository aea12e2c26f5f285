'use client';
/** Small three.js building blocks shared by the machine and part views. */
import { useEffect, useMemo } from 'react';
import { useThree } from '@react-three/fiber';
import { ArrowHelper, BufferGeometry, CanvasTexture, Color, Float32BufferAttribute, Matrix4, SRGBColorSpace, Vector3 } from 'three';
import { OrbitControls } from 'three/examples/jsm/controls/OrbitControls.js';
import type { Vec3 } from '@/lib/kinematics/schema';
import { length, sub, unit, frameFrom, type Bounds } from './scene-data';

const v3 = (v: Vec3) => new Vector3(v[0], v[1], v[2]);

/** Orbit, pan and zoom; redraws on demand only (the page does not spin the CPU). */
export function Controls({ target }: { target: Vec3 }) {
  const { camera, gl, invalidate } = useThree();
  useEffect(() => {
    const controls = new OrbitControls(camera, gl.domElement);
    controls.target.set(target[0], target[1], target[2]);
    controls.update();
    const redraw = () => invalidate();
    controls.addEventListener('change', redraw);
    redraw();
    return () => { controls.removeEventListener('change', redraw); controls.dispose(); };
  }, [camera, gl, invalidate, target]);
  return null;
}

export function Arrow({ from, to, color, head = 0.25 }: { from: Vec3; to: Vec3; color: string; head?: number }) {
  const arrow = useMemo(() => {
    const len = Math.max(1e-6, length(sub(to, from)));
    return new ArrowHelper(v3(unit(sub(to, from))), v3(from), len, new Color(color), len * head, len * head * 0.5);
  }, [from, to, color, head]);
  useEffect(() => () => arrow.dispose(), [arrow]);
  return <primitive object={arrow} />;
}

export function Polyline({ points, color, closed = false }: { points: readonly Vec3[]; color: string; closed?: boolean }) {
  const geometry = useMemo(() => {
    const pairs: number[] = [];
    const n = points.length;
    for (let i = 0; i + 1 < n || (closed && i < n); i++) {
      const a = points[i], b = points[(i + 1) % n];
      if (a && b) pairs.push(...a, ...b);
    }
    const g = new BufferGeometry();
    g.setAttribute('position', new Float32BufferAttribute(pairs, 3));
    return g;
  }, [points, closed]);
  useEffect(() => () => geometry.dispose(), [geometry]);
  return <lineSegments geometry={geometry}><lineBasicMaterial color={color} /></lineSegments>;
}

export function BoxEdges({ bounds, color }: { bounds: Bounds; color: string }) {
  const corners = useMemo(() => {
    const [x0, y0, z0] = bounds.min, [x1, y1, z1] = bounds.max;
    const c = (x: number, y: number, z: number): Vec3 => [x, y, z];
    return [
      [c(x0, y0, z0), c(x1, y0, z0), c(x1, y1, z0), c(x0, y1, z0)],
      [c(x0, y0, z1), c(x1, y0, z1), c(x1, y1, z1), c(x0, y1, z1)],
    ] as const;
  }, [bounds]);
  return (
    <group>
      <Polyline points={corners[0]} color={color} closed />
      <Polyline points={corners[1]} color={color} closed />
      {corners[0].map((p, i) => <Polyline key={i} points={[p, corners[1][i] ?? p]} color={color} />)}
    </group>
  );
}

/** A text label that always faces the camera. */
export function Label({ text, at, size, color = '#1f2937' }: { text: string; at: Vec3; size: number; color?: string }) {
  const texture = useMemo(() => {
    const canvas = document.createElement('canvas');
    canvas.width = 256; canvas.height = 128;
    const ctx = canvas.getContext('2d');
    if (ctx) {
      ctx.font = 'bold 72px sans-serif';
      ctx.textAlign = 'center'; ctx.textBaseline = 'middle';
      ctx.lineWidth = 10; ctx.strokeStyle = 'white'; ctx.strokeText(text, 128, 64);
      ctx.fillStyle = color; ctx.fillText(text, 128, 64);
    }
    const t = new CanvasTexture(canvas);
    t.colorSpace = SRGBColorSpace;
    return t;
  }, [text, color]);
  useEffect(() => () => texture.dispose(), [texture]);
  return (
    <sprite position={at} scale={[size * 2, size, 1]}>
      <spriteMaterial map={texture} depthTest={false} transparent />
    </sprite>
  );
}

/** X, Y, Z arrows of a frame with their letters. */
export function FrameAxes({ origin, x, y, z, size, prefix = '' }: { origin: Vec3; x: Vec3; y: Vec3; z: Vec3; size: number; prefix?: string }) {
  const axes: [string, Vec3, string][] = [['X', x, '#D55E00'], ['Y', y, '#009E73'], ['Z', z, '#0072B2']];
  return (
    <group>
      {axes.map(([name, dir, color]) => {
        const tip: Vec3 = [origin[0] + dir[0] * size, origin[1] + dir[1] * size, origin[2] + dir[2] * size];
        const lab: Vec3 = [origin[0] + dir[0] * size * 1.25, origin[1] + dir[1] * size * 1.25, origin[2] + dir[2] * size * 1.25];
        return (
          <group key={name}>
            <Arrow from={origin} to={tip} color={color} head={0.18} />
            <Label text={`${prefix}${name}`} at={lab} size={size * 0.22} color={color} />
          </group>
        );
      })}
    </group>
  );
}

/** A matrix placing a local shape (its Y along `axis`, X along `reference`) at `at`. */
export function placeAlong(at: Vec3, axis: Vec3, reference?: Vec3): Matrix4 {
  const f = frameFrom(axis, reference);
  // local X → f.x, local Y → axis (f.z), local Z → f.x × axis (right-handed: x, z, -y)
  const m = new Matrix4().makeBasis(v3(f.x), v3(f.z), v3(f.y).negate());
  return m.setPosition(v3(at));
}

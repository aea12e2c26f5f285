'use client';
/** Nominal shapes of features, translucent, in the part frame. */
import { useMemo } from 'react';
import { DoubleSide } from 'three';
import type { Feature } from '@/lib/features/schema';
import { scale, sub, unit } from './scene-data';
import { placeAlong } from './primitives';

function Material({ color }: { color: string }) {
  return <meshStandardMaterial color={color} transparent opacity={0.35} side={DoubleSide} depthWrite={false} />;
}

export function FeatureShape({ feature: f, color }: { feature: Feature; color: string }) {
  const matrix = useMemo(() => {
    switch (f.type) {
      case 'plane': return placeAlong(f.origin, f.normal, f.uDir);
      case 'bore': return placeAlong(sub(f.center, scale(unit(f.axis), f.depth / 2)), f.axis);
      case 'boss': return placeAlong(sub(f.center, scale(unit(f.axis), f.height / 2)), f.axis);
      case 'slot': case 'web': return placeAlong(sub(f.center, scale(unit(f.axis), f.depth / 2)), f.axis, f.widthDir);
      case 'sphere': return placeAlong(f.center, f.axis);
    }
  }, [f]);
  const geometry = (() => {
    switch (f.type) {
      case 'plane': return <boxGeometry args={[f.size[0], 0.2, f.size[1]]} />;
      case 'bore': return <cylinderGeometry args={[f.diameter / 2, f.diameter / 2, f.depth, 48, 1, true]} />;
      case 'boss': return <cylinderGeometry args={[f.diameter / 2, f.diameter / 2, f.height, 48]} />;
      case 'slot': case 'web': return <boxGeometry args={[f.width, f.depth, f.length]} />;
      case 'sphere': return <sphereGeometry args={[f.diameter / 2, 32, 16]} />;
    }
  })();
  return (
    <mesh matrix={matrix} matrixAutoUpdate={false} userData={{ featureUuid: f.uuid }}>
      {geometry}
      <Material color={color} />
    </mesh>
  );
}

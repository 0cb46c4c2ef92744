/**
 * Ground height under the wire, m: linear interpolation of the project's ground points, held
 * level beyond the first and last point; z = 0 when the project has no ground line (the
 * contract's default).
 */
import type { GroundPoint } from '../core/index.ts';

export function groundHeightAt(ground: readonly GroundPoint[] | undefined, x: number): number {
  if (!ground || ground.length === 0) return 0;
  if (x <= ground[0].x) return ground[0].z;
  for (let i = 1; i < ground.length; i++) {
    const a = ground[i - 1];
    const b = ground[i];
    if (x <= b.x) return a.z + ((b.z - a.z) * (x - a.x)) / (b.x - a.x);
  }
  return ground[ground.length - 1].z;
}

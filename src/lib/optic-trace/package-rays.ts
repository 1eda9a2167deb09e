/**
 * The package's escaping light as a ray list: traces the package alone and records the position and
 * direction of each ray as it leaves (at its last surface), for a ray file or as an optic's source.
 */
import { chunkPlan, raysInChunk } from '../trace/chunk-plan';
import { compileScene } from '../trace/compile-scene';
import { packageScene } from '../trace/package-scene';
import { validateTracePackage, type TracePackage } from '../trace/package-spec';
import { createTally } from '../trace/tally';
import { ESCAPE_RECORD } from '../trace/scene-layout';
import { recordEscapes, traceSceneChunk } from '../trace/trace-chunk';
import { packageOutline } from './optic-source';
import { formatRayFile } from './ray-file';

/**
 * Traces `rays` rays through the package and returns the escaping ones, ESCAPE_RECORD doubles each (x, y, z,
 * dx, dy, dz, wavelength nm — NaN for a package without phosphor, whose rays carry the design wavelength).
 * @throws RangeError naming the field for a bad package
 */
export function packageEscapingRays(pkg: TracePackage, rays: number, seed: number): { positionsDirections: Float64Array; count: number; launched: number } {
  validateTracePackage(pkg);
  const buffer = new Float64Array(ESCAPE_RECORD * rays);
  const recorded = recordEscapes(buffer);
  const compiled = compileScene(packageScene(pkg));
  const plan = chunkPlan(rays);
  const tally = createTally();
  let count = 0;
  try {
    for (let i = 0; i < plan.chunkCount; i++) traceSceneChunk(compiled, i, raysInChunk(plan, i), seed, tally);
    count = recorded();
  } finally {
    recordEscapes(new Float64Array(0));
  }
  return { positionsDirections: buffer.subarray(0, ESCAPE_RECORD * count), count, launched: rays };
}

/** The package's escaping rays as ray-file text (see ray-file.ts). */
export function packageRayFile(pkg: TracePackage, rays: number, seed: number, wavelengthNm: number, scenario: string): string {
  const { positionsDirections, count, launched } = packageEscapingRays(pkg, rays, seed);
  const plane = packageOutline(pkg).sourcePlaneMm;
  return formatRayFile(positionsDirections, count, wavelengthNm, scenario, `${count} of ${launched} traced rays escaped the package`, plane);
}

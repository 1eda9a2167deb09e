/**
 * The far field as a polar plot of the upper half space: the traced intensity mirrored about the
 * normal (the trace averages over azimuth, so left and right are the same), and a Lambertian of the
 * same flux. Light heading below the horizon is left to the Cartesian chart. Built on the shared polar
 * chart; pure.
 */
import { polarChart } from './polar-chart';
import { regroupFarField, type FarFieldInput } from './dome-far-field-chart';
import type { ChartSpec } from './spec';

const RAD = Math.PI / 180;

/** Signed angles −θ…+θ (radians) and the matching values, mirrored about 0. */
function mirrored(thetaDeg: number[], values: number[]): { thetaRad: number[]; intensity: number[] } {
  const thetaRad: number[] = [];
  const intensity: number[] = [];
  for (let i = thetaDeg.length - 1; i >= 0; i--) {
    thetaRad.push(-thetaDeg[i] * RAD);
    intensity.push(values[i]);
  }
  for (let i = 0; i < thetaDeg.length; i++) {
    thetaRad.push(thetaDeg[i] * RAD);
    intensity.push(values[i]);
  }
  return { thetaRad, intensity };
}

/**
 * Polar far-field chart (0–90° from the normal) in units of the Lambertian on-axis intensity
 * I0 = Φ/π. The traced profile uses zones of `group` bins (3° for 1° bins); the Lambertian cos θ is
 * sampled every 3°.
 */
export function domeFarFieldPolar(input: FarFieldInput, group = 3): ChartSpec {
  const zones = regroupFarField(input.bins, group, 90);
  const traced = mirrored(
    zones.map((z) => z.thetaDeg),
    zones.map((z) => z.intensity)
  );
  const lambertDeg: number[] = [];
  for (let t = 0; t <= 90; t += 3) lambertDeg.push(t);
  const lambert = mirrored(
    lambertDeg,
    lambertDeg.map((t) => Math.cos(t * RAD))
  );
  const any = zones.some((z) => z.intensity > 0);
  return polarChart(
    [
      ...(any ? [{ label: 'Monte Carlo trace', thetaRad: traced.thetaRad, intensity: traced.intensity, color: 0 }] : []),
      { label: 'Lambertian of the same flux', thetaRad: lambert.thetaRad, intensity: lambert.intensity, color: 5 }
    ],
    {
      title: 'Far field: polar plot',
      intensityLabel: 'Intensity / I₀',
      ariaLabel: any
        ? undefined
        : 'Far field: polar plot of the Lambertian reference only; no light escaped in this trace.'
    }
  );
}

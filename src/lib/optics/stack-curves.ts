import { thinFilmInto } from './thin-film';
import { incoherentStackInto } from './incoherent-stack';
import { validateStack, type StackLayer } from './layer';
import { requireInRange, requireInteger, requirePositive } from './guard';
import type { StackMode } from './stack-extraction';

/** Sampled R, T, A of a stack, per polarisation and unpolarised, against `x` (degrees or nm). */
export interface StackCurve {
  /** abscissa: angle of incidence in degrees ({@link rtVsAngle}) or wavelength in nm ({@link rVsWavelength}) */
  x: number[];
  Rs: number[];
  Rp: number[];
  R: number[];
  Ts: number[];
  Tp: number[];
  T: number[];
  A: number[];
}

/** Layers fixed, or a function giving them at each wavelength (dispersive materials). */
export type LayersAt = readonly StackLayer[] | ((wavelengthNm: number) => readonly StackLayer[]);

const buf = new Float64Array(6);

function emptyCurve(): StackCurve {
  return { x: [], Rs: [], Rp: [], R: [], Ts: [], Tp: [], T: [], A: [] };
}

function push(c: StackCurve, x: number): void {
  c.x.push(x);
  c.Rs.push(buf[0]);
  c.Rp.push(buf[1]);
  c.R.push(0.5 * (buf[0] + buf[1]));
  c.Ts.push(buf[2]);
  c.Tp.push(buf[3]);
  c.T.push(0.5 * (buf[2] + buf[3]));
  c.A.push(0.5 * (buf[4] + buf[5]));
}

function checkMode(mode: StackMode): void {
  if (mode !== 'coherent' && mode !== 'incoherent') {
    throw new RangeError(`mode must be 'coherent' or 'incoherent' (got ${String(mode)})`);
  }
}

/**
 * R, T, A of a stack against the angle of incidence in the chip, `points` samples evenly spaced from 0°
 * to 90° (degrees at this edge, for charts). Validates once, then sweeps without allocation per point.
 * @param nIn incident index (> 0); @param layers from the incident side; @param nOut exit index (> 0)
 * @param wavelengthNm vacuum wavelength (> 0); @param mode 'coherent' or 'incoherent'
 * @param points integer in [2, 10001] (default 181, every 0.5°)
 * @see Macleod, Thin-Film Optical Filters, ch. 2
 */
export function rtVsAngle(
  nIn: number,
  layers: readonly StackLayer[],
  nOut: number,
  wavelengthNm: number,
  mode: StackMode = 'coherent',
  points = 181
): StackCurve {
  validateStack(nIn, layers, nOut, wavelengthNm);
  checkMode(mode);
  requireInteger('points', points, 2, 10001);
  const run = mode === 'coherent' ? thinFilmInto : incoherentStackInto;
  const curve = emptyCurve();
  for (let i = 0; i < points; i++) {
    const deg = (90 * i) / (points - 1);
    run(buf, nIn, layers, nOut, wavelengthNm, i === points - 1 ? Math.PI / 2 : (deg * Math.PI) / 180);
    push(curve, deg);
  }
  return curve;
}

/**
 * R, T, A of a stack against vacuum wavelength at a fixed angle of incidence, `points` samples evenly
 * spaced from fromNm to toNm. Layers may be given as a function of wavelength for dispersive materials.
 * @param thetaInDeg angle of incidence in the chip, degrees, [0, 90]
 * @param fromNm, toNm wavelength range in nm (> 0, fromNm < toNm)
 * @param points integer in [2, 10001] (default 201)
 * @see Macleod, Thin-Film Optical Filters, ch. 2
 */
export function rVsWavelength(
  nIn: number,
  layers: LayersAt,
  nOut: number,
  thetaInDeg: number,
  fromNm: number,
  toNm: number,
  mode: StackMode = 'coherent',
  points = 201
): StackCurve {
  requireInRange('thetaInDeg', thetaInDeg, 0, 90);
  requirePositive('fromNm', fromNm);
  requirePositive('toNm', toNm);
  if (!(toNm > fromNm)) throw new RangeError(`toNm must be greater than fromNm (got ${fromNm} to ${toNm})`);
  checkMode(mode);
  requireInteger('points', points, 2, 10001);
  const run = mode === 'coherent' ? thinFilmInto : incoherentStackInto;
  const theta = thetaInDeg === 90 ? Math.PI / 2 : (thetaInDeg * Math.PI) / 180;
  const fixed = typeof layers === 'function' ? null : layers;
  if (fixed) validateStack(nIn, fixed, nOut, fromNm);
  const curve = emptyCurve();
  for (let i = 0; i < points; i++) {
    const lambda = fromNm + ((toNm - fromNm) * i) / (points - 1);
    let ls = fixed;
    if (!ls) {
      ls = (layers as (w: number) => readonly StackLayer[])(lambda);
      validateStack(nIn, ls, nOut, lambda);
    }
    run(buf, nIn, ls, nOut, lambda, theta);
    push(curve, lambda);
  }
  return curve;
}

/**
 * The one options object every optic design takes (names match the command line's: type, exitDiameterMm,
 * heightMm, material / n, targetBeamDeg, reflectance, gapMm), and the one place it is checked. Each check
 * throws a RangeError whose message is one line naming the field and its allowed range.
 */
import { resolveIndex } from '../materials/resolve-index';
import { fmt } from './format-for-message';
import { sourceAreaMm2, sourceRadiusMm, type LambertianSource } from './lambertian-source';

export type OpticType = 'reflector' | 'lens' | 'tir';
export type OpticShape = 'paraboloid' | 'cpc' | 'plano-convex' | 'aspheric' | 'tir';

export interface OpticDesignOptions {
  type: OpticType;
  /** reflector: 'paraboloid' (default) or 'cpc'; lens: 'aspheric' (default) or 'plano-convex'; tir: 'tir'. */
  shape?: OpticShape;
  /** Diameter of the optic's exit aperture, mm. */
  exitDiameterMm: number;
  /** Height of the optic's top (exit rim or face) above the source plane, mm. Optional for a CPC with a target beam. */
  heightMm?: number;
  /** Refractive index of the lens or TIR material (or give `material`). */
  n?: number;
  /** Library material id, name or alias (or an index as text), read at `wavelengthNm`. */
  material?: string;
  /** Wavelength at which `material` is read, nm; default 550. */
  wavelengthNm?: number;
  /** Full beam angle wanted, degrees: sizes a CPC, and is checked against the étendue limit. */
  targetBeamDeg?: number;
  /** Specular reflectance of a reflector, [0, 1]; default 0.92 (aluminium, common practice). */
  reflectance?: number;
  /** Clearance between the source plane and the optic's lowest point, mm; default 0. */
  gapMm?: number;
  /** The source, for the fit checks and the étendue limit; default a point. */
  source?: LambertianSource;
  /**
   * Area whose étendue (π A) bounds the source's light, mm², for the étendue limit; default the source's own
   * area (a package's light fills less than its outline: optic-trace/optic-source.ts packageEtendueAreaMm2).
   */
  sourceEtendueAreaMm2?: number;
  /** Thinnest edge of a lens, mm; default 1 (a mouldable edge, common practice). */
  edgeThicknessMm?: number;
  /** TIR collimator: the angle from the axis, at the source, splitting the lens part from the wall part; degrees. */
  splitAngleDeg?: number;
  /** TIR collimator: 'flat' exit face over a collimating cavity floor (default), or a collimating exit 'lens' over a flat floor. */
  exitFace?: 'flat' | 'lens';
  /** Chord tolerance of the sampled profiles, mm; default 0.001. */
  toleranceMm?: number;
}

/** Options after the checks: every default filled in, the index resolved. */
export interface CheckedDesignOptions {
  type: OpticType;
  shape: OpticShape;
  exitDiameterMm: number;
  heightMm: number | undefined;
  n: number;
  targetBeamDeg: number | undefined;
  reflectance: number;
  gapMm: number;
  source: LambertianSource | undefined;
  sourceRadiusMm: number;
  /** Area bounding the source's étendue, mm²; undefined without a source. */
  sourceEtendueAreaMm2: number | undefined;
  edgeThicknessMm: number;
  splitAngleDeg: number | undefined;
  exitFace: 'flat' | 'lens';
  toleranceMm: number;
}

/** Largest optic the designers accept, mm (a sanity bound, not physics). */
export const MAX_OPTIC_MM = 1000;

const SHAPES: Record<OpticType, OpticShape[]> = {
  reflector: ['paraboloid', 'cpc'],
  lens: ['aspheric', 'plano-convex'],
  tir: ['tir']
};

function num(field: string, value: unknown, min: number, max: number, openMin = false): number {
  const ok = typeof value === 'number' && Number.isFinite(value) && (openMin ? value > min : value >= min) && value <= max;
  if (!ok) {
    const lo = openMin ? `(${min}` : `[${min}`;
    throw new RangeError(`${field} must be a number in ${lo}, ${max}] (got ${typeof value === 'number' ? value : typeof value})`);
  }
  return value as number;
}

/**
 * Checks and completes the design options.
 * @throws RangeError naming the field and range: unknown type or shape, sizes ≤ 0 or > 1000 mm, reflectance outside
 *   [0, 1], index outside (1, 4] for a lens or TIR, an optic whose exit is not wider than the source, a gap that
 *   leaves no room below the top
 */
export function checkDesignOptions(o: OpticDesignOptions): CheckedDesignOptions {
  if (o === null || typeof o !== 'object') throw new RangeError('options must be an object with type, exitDiameterMm, heightMm');
  if (!(o.type in SHAPES)) throw new RangeError(`type must be reflector, lens or tir (got ${String(o.type)})`);
  const shape = o.shape ?? SHAPES[o.type][0];
  if (!SHAPES[o.type].includes(shape)) {
    throw new RangeError(`shape must be ${SHAPES[o.type].join(' or ')} for a ${o.type} (got ${String(shape)})`);
  }
  const exitDiameterMm = num('exitDiameterMm', o.exitDiameterMm, 0, MAX_OPTIC_MM, true);
  const heightMm = o.heightMm === undefined ? undefined : num('heightMm', o.heightMm, 0, MAX_OPTIC_MM, true);
  if (heightMm === undefined && !(shape === 'cpc' && o.targetBeamDeg !== undefined)) {
    throw new RangeError(`heightMm must be a number in (0, ${MAX_OPTIC_MM}] (got undefined)`);
  }
  const gapMm = o.gapMm === undefined ? 0 : num('gapMm', o.gapMm, 0, MAX_OPTIC_MM);
  if (heightMm !== undefined && gapMm >= heightMm) {
    throw new RangeError(`gapMm must be below heightMm ${heightMm}, in [0, ${heightMm}) (got ${gapMm})`);
  }
  const reflectance = o.reflectance === undefined ? 0.92 : num('reflectance', o.reflectance, 0, 1);
  const targetBeamDeg = o.targetBeamDeg === undefined ? undefined : num('targetBeamDeg', o.targetBeamDeg, 0, 180, true);
  const toleranceMm = o.toleranceMm === undefined ? 0.001 : num('toleranceMm', o.toleranceMm, 1e-6, 1);
  const edgeThicknessMm = o.edgeThicknessMm === undefined ? 1 : num('edgeThicknessMm', o.edgeThicknessMm, 0, MAX_OPTIC_MM);
  const splitAngleDeg = o.splitAngleDeg === undefined ? undefined : num('splitAngleDeg', o.splitAngleDeg, 5, 80);

  const exitFace = o.exitFace ?? 'flat';
  if (exitFace !== 'flat' && exitFace !== 'lens') throw new RangeError(`exitFace must be flat or lens (got ${String(exitFace)})`);
  let n = 1;
  if (o.type !== 'reflector') {
    if (o.n !== undefined) n = num('n', o.n, 1, 4, true);
    else if (o.material !== undefined) {
      const resolved = resolveIndex(o.material, o.wavelengthNm ?? 550);
      n = num(`n of material ${o.material}`, resolved.n, 1, 4, true);
    } else throw new RangeError('n must be a number in (1, 4] (or give material) for a lens or a TIR collimator');
  }

  const radius = o.source === undefined ? 0 : sourceRadiusMm(o.source);
  if (radius >= exitDiameterMm / 2) {
    throw new RangeError(
      `exitDiameterMm must exceed the source's diameter ${fmt(2 * radius)} mm: the optic is smaller than the source (got ${exitDiameterMm})`
    );
  }
  return {
    type: o.type,
    shape,
    exitDiameterMm,
    heightMm,
    n,
    targetBeamDeg,
    reflectance,
    gapMm,
    source: o.source,
    sourceRadiusMm: radius,
    sourceEtendueAreaMm2:
      o.source === undefined ? undefined : o.sourceEtendueAreaMm2 === undefined ? sourceAreaMm2(o.source) : num('sourceEtendueAreaMm2', o.sourceEtendueAreaMm2, 0, 1e6, true),
    edgeThicknessMm,
    splitAngleDeg,
    exitFace,
    toleranceMm
  };
}

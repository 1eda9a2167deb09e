/**
 * One entry point for every optic: checks the options once, checks a target beam against the étendue limit
 * when a source is given, and hands over to the shape's designer.
 */
import { designAsphericLens } from './aspheric-lens';
import { designCpc } from './cpc';
import { checkDesignOptions, type OpticDesignOptions } from './design-options';
import { checkTargetBeam } from './etendue-limit';
import type { OpticDesign } from './optic-design';
import { designParaboloid } from './paraboloid';
import { designPlanoConvexLens } from './plano-convex-lens';
import { designTirCollimator } from './tir-collimator';

/**
 * Designs an optic.
 * @example designOptic({ type: 'tir', exitDiameterMm: 20, heightMm: 12, n: 1.49 })
 * @throws RangeError, one line naming the field and allowed range, for any input it cannot design
 */
export function designOptic(options: OpticDesignOptions): OpticDesign {
  const o = checkDesignOptions(options);
  if (o.targetBeamDeg !== undefined && o.sourceEtendueAreaMm2 !== undefined) {
    checkTargetBeam(o.targetBeamDeg, { sourceAreaMm2: o.sourceEtendueAreaMm2, exitDiameterMm: o.exitDiameterMm });
  }
  switch (o.shape) {
    case 'paraboloid':
      return designParaboloid(o);
    case 'cpc':
      return designCpc(o);
    case 'aspheric':
      return designAsphericLens(o);
    case 'plano-convex':
      return designPlanoConvexLens(o);
    case 'tir':
      return designTirCollimator(o);
  }
}

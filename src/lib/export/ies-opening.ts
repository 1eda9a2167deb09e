/**
 * The luminous opening of an LM-63 file: width, length and height with signs that name the shape.
 * Sign conventions of ANSI/IES LM-63-2019 (luminous opening table; from memory — the positive/zero
 * rectangular cases are the long-standing LM-63-2002 ones, the negative "round" codes were added in
 * the 2019 edition):
 *   point 0 0 0 · rectangle w l 0 · box with luminous sides w l h · disc −d −d 0 ·
 *   vertical cylinder −d −d h · sphere −d −d −d.
 * A dome has no shape of its own in the standard; it is written as the vertical cylinder with the
 * dome's base diameter and height, the listed shape whose outline is closest.
 */

export type IesOpeningShape = 'point' | 'rectangle' | 'box' | 'disc' | 'cylinder' | 'sphere';

export interface IesOpening {
  shape: IesOpeningShape;
  /** Width along x, mm (a diameter for round shapes). */
  widthMm: number;
  /** Length along y, mm (equals the width for round shapes). */
  lengthMm: number;
  /** Height, mm (ignored for point, rectangle and disc). */
  heightMm: number;
}

const SHAPES: readonly IesOpeningShape[] = ['point', 'rectangle', 'box', 'disc', 'cylinder', 'sphere'];

/** Largest accepted opening size, mm (10 m). */
export const OPENING_MAX_MM = 10_000;

function size(field: string, value: number): number {
  if (typeof value !== 'number' || !(value > 0 && value <= OPENING_MAX_MM)) {
    throw new RangeError(`${field} must be a number in (0, ${OPENING_MAX_MM}] mm (got ${String(value)})`);
  }
  return value;
}

/**
 * The three signed opening numbers of an LM-63 file, in metres (units type 2).
 * @param opening shape and sizes in mm, each in (0, 10 000] where the shape uses it
 * @returns [width, length, height] in m, signed per the table in this file's header
 * @example iesOpeningMetres({ shape: 'cylinder', widthMm: 5, lengthMm: 5, heightMm: 2.5 }) // [-0.005, -0.005, 0.0025]
 */
export function iesOpeningMetres(opening: IesOpening): [number, number, number] {
  if (!opening || !SHAPES.includes(opening.shape)) {
    throw new RangeError(`opening.shape must be one of ${SHAPES.join(', ')} (got ${String(opening?.shape)})`);
  }
  const m = 1e-3; // mm → m
  switch (opening.shape) {
    case 'point':
      return [0, 0, 0];
    case 'rectangle':
      return [size('opening.widthMm', opening.widthMm) * m, size('opening.lengthMm', opening.lengthMm) * m, 0];
    case 'box':
      return [
        size('opening.widthMm', opening.widthMm) * m,
        size('opening.lengthMm', opening.lengthMm) * m,
        size('opening.heightMm', opening.heightMm) * m
      ];
    case 'disc': {
      const d = size('opening.widthMm', opening.widthMm) * m;
      return [-d, -d, 0];
    }
    case 'cylinder': {
      const d = size('opening.widthMm', opening.widthMm) * m;
      return [-d, -d, size('opening.heightMm', opening.heightMm) * m];
    }
    case 'sphere': {
      const d = size('opening.widthMm', opening.widthMm) * m;
      return [-d, -d, -d];
    }
  }
}

/**
 * The opening of a package: the dome or cylinder around the chip (see the header for the dome), the
 * bare chip as a box with luminous sides, or a cup's rim (a dome on it adds its height): a luminous
 * disc of the rim's diameter (a cylinder of the dome's height with a dome).
 */
export function packageOpening(
  encapsulant: { shape: 'none' | 'dome' | 'cylinder' | 'box' | 'flat'; radiusMm: number; heightMm: number },
  chip: { widthMm: number; lengthMm: number; heightMm: number },
  body?: { kind: 'flat' } | { kind: 'cup'; topRadiusMm: number; fill?: 'flat' | 'dome' | 'none' }
): IesOpening {
  if (body?.kind === 'cup') {
    const d = 2 * body.topRadiusMm;
    const domed = body.fill === 'dome' || (body.fill === undefined && encapsulant.shape === 'dome');
    return domed ? { shape: 'cylinder', widthMm: d, lengthMm: d, heightMm: encapsulant.heightMm } : { shape: 'disc', widthMm: d, lengthMm: d, heightMm: 0 };
  }
  if (encapsulant.shape === 'none' || encapsulant.shape === 'flat') {
    return { shape: 'box', widthMm: chip.widthMm, lengthMm: chip.lengthMm, heightMm: chip.heightMm };
  }
  const d = 2 * encapsulant.radiusMm;
  if (encapsulant.shape === 'box') return { shape: 'box', widthMm: d, lengthMm: d, heightMm: encapsulant.heightMm };
  return { shape: 'cylinder', widthMm: d, lengthMm: d, heightMm: encapsulant.heightMm };
}

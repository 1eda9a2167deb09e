import { validateStack, type StackLayer } from './layer';

/** Where rays in one band of chip angles end up, in the ray (thick-layer) picture. */
export interface TrappedBand {
  /** band of angles of incidence inside the chip, radians, from ≤ angle < to */
  fromRad: number;
  toRad: number;
  /** the same in degrees, for display */
  fromDeg: number;
  toDeg: number;
  /** 'escapes': reaches the outside medium; 'trapped': totally reflected somewhere in the stack */
  fate: 'escapes' | 'trapped';
  /**
   * Medium whose lower face reflects the rays totally (its index is below nIn·sin θ): a layer index
   * (0-based, from the chip outward) or 'outside'. null when the rays escape.
   */
  blockedBy: number | 'outside' | null;
  /**
   * Medium the rays are turned back in: 'chip', or the 0-based index of the last layer they reach.
   * null when the rays escape.
   */
  trappedIn: 'chip' | number | null;
  /** one plain sentence for the UI (layers counted from 1) */
  text: string;
}

const DEG = 180 / Math.PI;

function fmt(deg: number): string {
  return `${deg.toFixed(1)}°`;
}

/**
 * Splits the chip's angles of incidence [0°, 90°] into bands by where rays are totally reflected on their
 * way out through a planar stack, using n sin θ invariance: a ray at angle θ in the chip (index nIn) can
 * enter a medium of index n only while nIn sin θ < n. The first medium, going outward, with
 * n ≤ nIn sin θ reflects it totally at its lower face; the ray is then trapped in the medium just below
 * (the chip, or a layer). Because every band boundary is asin(n/nIn) of one medium, the band that
 * reaches the outside is always [0, asin(nOut/nIn)): a planar stack never widens the escape cone.
 *
 * Ray picture, right for thick layers. In a coherent thin-film stack a layer thinner than about a
 * wavelength can still pass some light by tunnelling (frustrated total internal reflection), but only
 * for angles inside the outside escape cone; beyond it nothing leaves either way.
 * Layer indices use the real part n.
 * @param nIn chip index (> 0); @param layers from the chip outward; @param nOut outside index (> 0)
 * @returns bands in increasing angle, covering [0, π/2] without gaps; adjacent bands differ in fate or place
 * @see Born & Wolf, Principles of Optics, §1.5.1 and §1.5.4
 */
export function trappedBands(nIn: number, layers: readonly StackLayer[], nOut: number): TrappedBand[] {
  validateStack(nIn, layers, nOut, 1);

  // Media outward from the chip: layers 0..L−1, then the outside (index L)
  const L = layers.length;
  const mediumN = (m: number): number => (m < L ? layers[m].n : nOut);

  // Band edges: the critical angle of every medium less dense than the chip
  const edges: number[] = [0, Math.PI / 2];
  for (let m = 0; m <= L; m++) {
    const n = mediumN(m);
    if (n < nIn) edges.push(Math.asin(n / nIn));
  }
  edges.sort((a, b) => a - b);

  const bands: TrappedBand[] = [];
  for (let i = 0; i + 1 < edges.length; i++) {
    const from = edges[i];
    const to = edges[i + 1];
    if (!(to > from)) continue;
    // First medium that refuses a ray at the middle of the band
    const s = nIn * Math.sin(0.5 * (from + to));
    let blocked = -1;
    for (let m = 0; m <= L; m++) {
      if (mediumN(m) <= s) {
        blocked = m;
        break;
      }
    }
    const last = bands[bands.length - 1];
    const blockedBy: TrappedBand['blockedBy'] = blocked < 0 ? null : blocked === L ? 'outside' : blocked;
    if (last && last.blockedBy === blockedBy) {
      last.toRad = to;
      last.toDeg = to * DEG;
      continue;
    }
    bands.push({
      fromRad: from,
      toRad: to,
      fromDeg: from * DEG,
      toDeg: to * DEG,
      fate: blocked < 0 ? 'escapes' : 'trapped',
      blockedBy,
      trappedIn: blocked < 0 ? null : blocked === 0 ? 'chip' : blocked - 1,
      text: ''
    });
  }

  for (const b of bands) b.text = describe(b, nIn, layers, nOut);
  return bands;
}

function describe(b: TrappedBand, nIn: number, layers: readonly StackLayer[], nOut: number): string {
  const range = `Rays from ${fmt(b.fromDeg)} to ${fmt(b.toDeg)} in the chip`;
  if (b.fate === 'escapes') return `${range} leave into the outside medium (n ${nOut.toFixed(2)}).`;
  const blocker =
    b.blockedBy === 'outside'
      ? `the outside medium (n ${nOut.toFixed(2)})`
      : `layer ${(b.blockedBy as number) + 1} (n ${layers[b.blockedBy as number].n.toFixed(2)})`;
  if (b.trappedIn === 'chip') {
    return `${range} never leave the chip (n ${nIn.toFixed(2)}): they are totally reflected at its top face, below ${blocker}.`;
  }
  const i = b.trappedIn as number;
  return `${range} reach layer ${i + 1} (n ${layers[i].n.toFixed(2)}) and are totally reflected at its top face, below ${blocker}.`;
}

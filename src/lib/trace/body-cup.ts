/**
 * A reflector cup as scene parts: the floor disc (z = 0, r ≤ r0), the cone-frustum wall from r0 at
 * the floor to r1 at the rim z = Hc, and what closes the cup: a flat top disc of the fill at the rim,
 * a dome (spheroid cap centred on the rim plane) with the flat annulus beside it, or nothing (an
 * empty cup: the outside medium fills it and rays leave through the open rim).
 * The chip's fit is checked by validateTracePackage before a cup is built.
 */
import type { Behaviour, SceneSurface } from './scene';

export interface CupBuild {
  floorRadiusMm: number;
  topRadiusMm: number;
  depthMm: number;
  /** Medium inside the cup (the encapsulant, or the outside medium when empty). */
  inside: string;
  /** Medium above the rim. */
  outside: string;
  floor: Behaviour;
  wall: Behaviour;
  /** 'flat': top disc at the rim; 'dome': a dome of radius ≤ topRadiusMm and height h on the rim plane; 'none': open. */
  fill: 'flat' | 'dome' | 'none';
  domeRadiusMm: number;
  domeHeightMm: number;
}

/** The cup's surfaces, in the order its inside medium tests them. */
export function cupSurfaces(c: CupBuild): SceneSurface[] {
  const Hc = c.depthMm;
  const surfaces: SceneSurface[] = [
    {
      name: 'floor',
      shape: { kind: 'disc', at: 0, normalSign: 1, rInner: 0, rOuter: c.floorRadiusMm },
      front: c.inside,
      behind: null,
      behaviour: c.floor
    },
    {
      name: 'wall',
      shape: { kind: 'frustum', r0: c.floorRadiusMm, z0: 0, r1: c.topRadiusMm, z1: Hc },
      front: null,
      behind: c.inside,
      behaviour: c.wall
    }
  ];
  if (c.fill === 'flat') {
    surfaces.push({
      name: 'cup top',
      shape: { kind: 'disc', at: Hc, normalSign: 1, rInner: 0, rOuter: c.topRadiusMm },
      front: c.outside,
      behind: c.inside,
      behaviour: { kind: 'fresnel' },
      // the only surface bounding the outside: a plane is left for good
      finalExit: true
    });
  } else if (c.fill === 'dome') {
    surfaces.push({
      name: 'dome',
      shape: { kind: 'spheroid-cap', radius: c.domeRadiusMm, height: c.domeHeightMm, zCentre: Hc },
      front: c.outside,
      behind: c.inside,
      behaviour: { kind: 'fresnel' },
      legacyEscape: 'escapedDome',
      // alone (no annulus beside it) the dome is all the outside meets
      finalExit: c.domeRadiusMm >= c.topRadiusMm
    });
    if (c.domeRadiusMm < c.topRadiusMm) {
      surfaces.push({
        name: 'rim annulus',
        shape: { kind: 'disc', at: Hc, normalSign: 1, rInner: c.domeRadiusMm, rOuter: c.topRadiusMm },
        front: c.outside,
        behind: c.inside,
        behaviour: { kind: 'fresnel' }
      });
    }
  }
  return surfaces;
}

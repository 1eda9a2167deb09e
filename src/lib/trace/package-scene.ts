/**
 * A package (package-spec.ts) as a scene description (scene.ts): the chip's layers, the body
 * around it and the outside medium. The bodies' builders own their shapes; the fit checks are made
 * once, by validateTracePackage, before a package gets here.
 *
 * Today's flat body: the chip stands on an endless base plane z = 0 (a specular mirror) under a
 * dome (spheroid cap), a cylinder (wall and flat top disc) or nothing (the chip in the outside
 * medium; the base then borders nothing the rays can reach again, as escape is final).
 */
import { chipParts } from './body-chip';
import { emitterHeightMm, type TracePackage } from './package-spec';
import type { MirrorSpec, SceneDescription, SceneMedium, SceneSurface } from './scene';

const OUTSIDE = 'outside';
const ENCAPSULANT = 'encapsulant';

/** The scene of a package (trusted input: check it first with validateTracePackage). */
export function packageScene(pkg: TracePackage): SceneDescription {
  const enc = pkg.encapsulant;
  const bare = enc.shape === 'none';
  const around = bare ? OUTSIDE : ENCAPSULANT;
  const base: MirrorSpec = pkg.base;
  const chip = chipParts({
    widthMm: pkg.chip.widthMm,
    lengthMm: pkg.chip.lengthMm,
    layers: [{ name: 'chip', thicknessMm: pkg.chip.heightMm, n: pkg.chip.n, absorptionPerMm: pkg.chip.absorptionPerMm }],
    around,
    bottom: { name: 'base under the chip', mirror: base, absorbedBin: 'base' },
    top: { kind: 'fresnel' }
  });
  const media: SceneMedium[] = [...chip.media];
  const surfaces: SceneSurface[] = [...chip.surfaces];
  if (!bare) {
    media.push({ name: ENCAPSULANT, role: 'encapsulant', n: enc.n, absorptionPerMm: enc.absorptionPerMm });
    surfaces.push({
      name: 'base',
      shape: { kind: 'disc', at: 0, normalSign: 1, rInner: 0, rOuter: Infinity },
      front: ENCAPSULANT,
      behind: null,
      behaviour: { kind: 'mirror', mirror: base }
    });
    if (enc.shape === 'dome') {
      surfaces.push({
        name: 'dome',
        shape: { kind: 'spheroid-cap', radius: enc.radiusMm, height: enc.heightMm, zCentre: 0 },
        front: OUTSIDE,
        behind: ENCAPSULANT,
        behaviour: { kind: 'fresnel' },
        legacyEscape: 'escapedDome'
      });
    } else {
      surfaces.push(
        {
          name: 'cylinder side',
          shape: { kind: 'cylinder', radius: enc.radiusMm, z0: 0, z1: enc.heightMm },
          front: OUTSIDE,
          behind: ENCAPSULANT,
          behaviour: { kind: 'fresnel' },
          legacyEscape: 'escapedCylinderSide'
        },
        {
          name: 'cylinder top',
          shape: { kind: 'disc', at: enc.heightMm, normalSign: 1, rInner: 0, rOuter: enc.radiusMm },
          front: OUTSIDE,
          behind: ENCAPSULANT,
          behaviour: { kind: 'fresnel' },
          legacyEscape: 'escapedCylinderTop'
        }
      );
    }
  }
  media.push({ name: OUTSIDE, role: 'outside', n: pkg.outsideN, absorptionPerMm: 0 });
  return {
    media,
    surfaces,
    outside: OUTSIDE,
    emitter: { medium: 'chip', mode: pkg.chip.emission, z: emitterHeightMm(pkg.chip) },
    polarization: pkg.polarization
  };
}

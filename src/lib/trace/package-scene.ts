/**
 * A package (package-spec.ts) as a scene description (scene.ts): the chip's layers, the body
 * around it and the outside medium. The bodies' builders own their shapes; the fit checks are made
 * once, by validateTracePackage, before a package gets here.
 *
 * The flat body: the chip stands on an endless base plane z = 0 (a specular or diffuse reflector)
 * under a dome (spheroid cap), a cylinder (wall and flat top disc) or nothing (the chip in the outside
 * medium; the base then borders nothing the rays can reach again, as escape is final).
 * The cup body: see body-cup.ts; its floor is the base.
 * The chip: one box, or layers (body-chip.ts); its bottom is the base beneath it, or its own mirror.
 */

/** A reflector as a surface behaviour: specular mirror (number or metal) or Lambertian. */
function reflector(m: TraceBase, finish: 'specular' | 'diffuse'): Behaviour {
  if (finish === 'diffuse' && m.kind === 'reflectance') return { kind: 'diffuse', reflectance: m.reflectance };
  return { kind: 'mirror', mirror: m };
}
import { chipParts } from './body-chip';
import { cupSurfaces } from './body-cup';
import { chipLayers, emitterHeightMm, type TraceBase, type TracePackage } from './package-spec';
import type { Behaviour, SceneDescription, SceneMedium, SceneSurface } from './scene';

const OUTSIDE = 'outside';
const ENCAPSULANT = 'encapsulant';

/** The scene of a package (trusted input: check it first with validateTracePackage). */
export function packageScene(pkg: TracePackage): SceneDescription {
  const enc = pkg.encapsulant;
  const body = pkg.body ?? { kind: 'flat' as const };
  const cup = body.kind === 'cup' ? body : null;
  const bare = cup ? cup.fill === 'none' : enc.shape === 'none';
  const around = bare ? OUTSIDE : ENCAPSULANT;
  const base = reflector(pkg.base, pkg.baseFinish ?? 'specular');
  const layers = chipLayers(pkg.chip);
  const chip = chipParts({
    widthMm: pkg.chip.widthMm,
    lengthMm: pkg.chip.lengthMm,
    layers,
    around,
    bottom: pkg.chip.mirror
      ? { name: 'chip mirror', behaviour: { kind: 'mirror', mirror: pkg.chip.mirror }, absorbedBin: 'chip mirror' }
      : { name: 'base under the chip', behaviour: base, absorbedBin: cup ? 'floor' : 'base' },
    top: pkg.chip.topScatter ? { kind: 'textured', scatteredFraction: pkg.chip.topScatter } : { kind: 'fresnel' }
  });
  const media: SceneMedium[] = [...chip.media];
  const surfaces: SceneSurface[] = [...chip.surfaces];
  const ph = pkg.phosphor;
  if (!bare) {
    media.push({
      name: ENCAPSULANT, role: 'encapsulant', n: enc.n, absorptionPerMm: enc.absorptionPerMm,
      ...(ph ? { phosphor: { coefficients: ph.coefficients, emission: ph.emission, quantumYield: ph.quantumYield, ...(ph.mixedWith?.length ? { mixedWith: ph.mixedWith } : {}) } } : {})
    });
  }
  if (cup) {
    surfaces.push(
      ...cupSurfaces({
        floorRadiusMm: cup.floorRadiusMm,
        topRadiusMm: cup.topRadiusMm,
        depthMm: cup.depthMm,
        inside: around,
        outside: OUTSIDE,
        floor: base,
        wall: reflector({ kind: 'reflectance', reflectance: cup.wallReflectance }, cup.wallFinish),
        fill: cup.fill,
        domeRadiusMm: enc.radiusMm,
        domeHeightMm: enc.heightMm
      })
    );
  } else if (!bare) {
    surfaces.push({
      name: 'base',
      shape: { kind: 'disc', at: 0, normalSign: 1, rInner: 0, rOuter: Infinity },
      front: ENCAPSULANT,
      behind: null,
      behaviour: base
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
    emitter: { medium: layers[pkg.chip.emitLayer ?? 0].name, mode: pkg.chip.emission, z: emitterHeightMm(pkg.chip) },
    polarization: pkg.polarization,
    ...(ph ? { chipSpectrum: ph.chipSpectrum } : {})
  };
}

/**
 * A package (package-spec.ts) as a scene description (scene.ts): the chip's layers, the body
 * around it and the outside medium. The bodies' builders own their shapes; the fit checks are made
 * once, by validateTracePackage, before a package gets here.
 *
 * The flat body: the chip stands on an endless base plane z = 0 (a specular or diffuse reflector)
 * under a dome (spheroid cap), a cylinder (wall and flat top disc), a square box (four side rectangles
 * and a top) or nothing (the chip in the outside
 * medium; the base then borders nothing the rays can reach again, as escape is final).
 * The cup body: see body-cup.ts; its floor is the base.
 * The chip: one box, or layers (body-chip.ts); its bottom is the base beneath it, or its own mirror.
 * A phosphor: dispersed in the encapsulant medium, or a layer of its own (body-phosphor.ts). With the
 * package's `dispersion`, each medium carries its index over wavelength for spectral rays.
 */

/** A reflector as a surface behaviour: specular mirror (number or metal) or Lambertian. */
function reflector(m: TraceBase, finish: 'specular' | 'diffuse'): Behaviour {
  if (finish === 'diffuse' && m.kind === 'reflectance') return { kind: 'diffuse', reflectance: m.reflectance };
  return { kind: 'mirror', mirror: m };
}
import { chipParts } from './body-chip';
import { cupSurfaces } from './body-cup';
import { phosphorLayerName, withPhosphorLayer } from './body-phosphor';
import { chipLayers, emitterHeightMm, type TraceBase, type TracePackage } from './package-spec';
import type { Behaviour, SceneDescription, SceneMedium, SceneSurface } from './scene';

const OUTSIDE = 'outside';
const ENCAPSULANT = 'encapsulant';

/** A square encapsulant block |x|, |y| ≤ s, 0 ≤ z ≤ h: four sides and the top, the outside in front. */
function encapsulantBoxSurfaces(s: number, h: number): SceneSurface[] {
  const side = (name: string, axis: 0 | 1, sign: 1 | -1): SceneSurface => ({
    name,
    shape: { kind: 'rect', axis, at: sign * s, normalSign: sign, uMin: -s, uMax: s, vMin: 0, vMax: h },
    front: OUTSIDE,
    behind: ENCAPSULANT,
    behaviour: { kind: 'fresnel' },
    escapedBin: 'box sides',
    finalExit: true
  });
  return [
    {
      name: 'box top',
      shape: { kind: 'rect', axis: 2, at: h, normalSign: 1, uMin: -s, uMax: s, vMin: -s, vMax: s },
      front: OUTSIDE,
      behind: ENCAPSULANT,
      behaviour: { kind: 'fresnel' },
      finalExit: true
    },
    side('box +x', 0, 1),
    side('box −x', 0, -1),
    side('box +y', 1, 1),
    side('box −y', 1, -1)
  ];
}

/** The medium with its index over wavelength, when the package gives one. */
function withIndexRows(m: SceneMedium, rows: [number, number][] | null | undefined): SceneMedium {
  return rows ? { ...m, indexRows: rows } : m;
}

/** The scene of a package (trusted input: check it first with validateTracePackage). */
export function packageScene(pkg: TracePackage): SceneDescription {
  const enc = pkg.encapsulant;
  const body = pkg.body ?? { kind: 'flat' as const };
  const cup = body.kind === 'cup' ? body : null;
  const bare = cup ? cup.fill === 'none' : enc.shape === 'none';
  const around = bare ? OUTSIDE : ENCAPSULANT;
  const base = reflector(pkg.base, pkg.baseFinish ?? 'specular');
  const layers = chipLayers(pkg.chip);
  const ph = pkg.phosphor;
  const region = ph && !bare && ph.region !== 'encapsulant' ? ph.region : null;
  const layerMedium = region ? phosphorLayerName(region) : null;
  const thicknessMm = ph?.thicknessMm ?? 0;
  const disp = pkg.dispersion;
  const chip = chipParts({
    widthMm: pkg.chip.widthMm,
    lengthMm: pkg.chip.lengthMm,
    layers,
    around: region === 'conformal' ? layerMedium! : around,
    bottom: pkg.chip.mirror
      ? { name: 'chip mirror', behaviour: { kind: 'mirror', mirror: pkg.chip.mirror }, absorbedBin: 'chip mirror' }
      : { name: 'base under the chip', behaviour: base, absorbedBin: cup ? 'floor' : 'base' },
    top: pkg.chip.topScatter ? { kind: 'textured', scatteredFraction: pkg.chip.topScatter } : { kind: 'fresnel' },
    ...(region === 'floor' ? { below: { medium: layerMedium!, heightMm: thicknessMm } } : {})
  });
  const media: SceneMedium[] = chip.media.map((m, i) => withIndexRows(m, disp?.chipLayers?.[i]));
  // A bare chip on the flat base: its box is all the outside meets (the base then borders nothing)
  const bareBox = bare && !cup;
  let surfaces: SceneSurface[] = chip.surfaces.map((s) => (bareBox && chip.outerFaces.includes(s.name) ? { ...s, finalExit: true } : s));
  const particles = ph
    ? { phosphor: { coefficients: ph.coefficients, emission: ph.emission, quantumYield: ph.quantumYield, ...(ph.mixedWith?.length ? { mixedWith: ph.mixedWith } : {}) } }
    : {};
  if (!bare) {
    // a dome, cylinder or box on the base, or a cup filled flat, is one convex region around the chip
    // (a dome on a cup's rim only when it spans the rim; a phosphor layer or plate adds surfaces inside)
    const convex = !region && (cup ? cup.fill === 'flat' || enc.radiusMm >= cup.topRadiusMm : true);
    media.push(
      withIndexRows(
        { name: ENCAPSULANT, role: 'encapsulant', n: enc.n, absorptionPerMm: enc.absorptionPerMm, ...(region ? {} : particles), ...(convex ? { convexAroundSolid: true } : {}) },
        disp?.encapsulant
      )
    );
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
        legacyEscape: 'escapedDome',
        finalExit: true
      });
    } else if (enc.shape === 'box') {
      surfaces.push(...encapsulantBoxSurfaces(enc.radiusMm, enc.heightMm));
    } else {
      surfaces.push(
        {
          name: 'cylinder side',
          shape: { kind: 'cylinder', radius: enc.radiusMm, z0: 0, z1: enc.heightMm },
          front: OUTSIDE,
          behind: ENCAPSULANT,
          behaviour: { kind: 'fresnel' },
          legacyEscape: 'escapedCylinderSide',
          finalExit: true
        },
        {
          name: 'cylinder top',
          shape: { kind: 'disc', at: enc.heightMm, normalSign: 1, rInner: 0, rOuter: enc.radiusMm },
          front: OUTSIDE,
          behind: ENCAPSULANT,
          behaviour: { kind: 'fresnel' },
          legacyEscape: 'escapedCylinderTop',
          finalExit: true
        }
      );
    }
  }
  if (region && layerMedium) {
    // the layer is the encapsulant material holding the particles
    media.push(withIndexRows({ name: layerMedium, role: 'encapsulant', n: enc.n, absorptionPerMm: enc.absorptionPerMm, ...particles }, disp?.encapsulant));
    surfaces = withPhosphorLayer(surfaces, {
      region,
      thicknessMm,
      medium: layerMedium,
      host: ENCAPSULANT,
      chip: pkg.chip,
      base: { behaviour: base, absorbedBin: cup ? 'floor' : 'base' }
    });
  }
  media.push(withIndexRows({ name: OUTSIDE, role: 'outside', n: pkg.outsideN, absorptionPerMm: 0 }, disp?.outside));
  return {
    media,
    surfaces,
    outside: OUTSIDE,
    emitter: { medium: layers[pkg.chip.emitLayer ?? 0].name, mode: pkg.chip.emission, z: emitterHeightMm(pkg.chip) },
    polarization: pkg.polarization,
    ...(ph ? { chipSpectrum: ph.chipSpectrum } : {})
  };
}

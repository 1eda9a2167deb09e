/**
 * The to-scale cross-section of a package (the x–z plane through the axis), built from the scene
 * description the tracer compiles (packageScene) — never from a second geometry. Pure: it returns
 * SVG path strings in mm, with the SVG y axis pointing down (y = −z), for PackageSection.svelte.
 *
 * Media are filled from the solids that bound them: a box medium (a chip layer) is its rectangle; a
 * medium behind a dome, a cylinder or a cup wall fills the region that surface closes over the plane
 * it stands on (their union is the encapsulant, a cup filled and domed included); a medium bounded by
 * flat faces only (a conformal phosphor layer) fills the box of those faces. A medium holding a phosphor
 * has the role 'phosphor' (its own fill) and says so in the legend. The outside medium is left blank. Surfaces are strokes styled by their behaviour; faces whose normal is ±y do not cut
 * the x–z plane and are not drawn.
 */
import type { Behaviour, SceneDescription, SceneSurface, Shape } from '$lib/trace/scene';

export type StrokeStyle = 'mirror' | 'diffuse' | 'interface' | 'textured' | 'absorber';

export interface SectionRegion {
  medium: string;
  role: 'chip' | 'encapsulant' | 'phosphor';
  /** Index into the legend's media (fill colour). */
  colour: number;
  d: string;
  title: string;
}

export interface SectionStroke {
  surface: string;
  style: StrokeStyle;
  d: string;
  title: string;
}

export interface SectionLegendMedium {
  name: string;
  colour: number;
  text: string;
}

export interface PackageSection {
  /** SVG viewBox in mm: x, y (= −zTop), width, height. */
  viewBox: [number, number, number, number];
  regions: SectionRegion[];
  strokes: SectionStroke[];
  /** The emitting plane (a line) or emitting volume (a rectangle path). */
  emitter: { d: string; volume: boolean; title: string };
  media: SectionLegendMedium[];
  /** Stroke styles present, for the legend. */
  styles: StrokeStyle[];
  /** Overall width and height of the package drawn, mm (for the caption). */
  sizeMm: { width: number; height: number };
}

/** Points along the half ellipse of a spheroid cap, x from −R to R (the cut through the axis). */
const CAP_STEPS = 48;

function fmt(x: number): string {
  return String(Number(x.toPrecision(6)));
}

/** An index to four significant digits, as the panel shows it. */
function index(n: number): string {
  return String(Number(n.toPrecision(4)));
}

function mm(x: number): string {
  return `${fmt(x)} mm`;
}

function pt(x: number, z: number): string {
  return `${fmt(x)} ${fmt(-z)}`;
}

function capPoints(radius: number, height: number, zCentre: number): [number, number][] {
  const out: [number, number][] = [];
  for (let i = 0; i <= CAP_STEPS; i++) {
    const phi = Math.PI * (1 - i / CAP_STEPS);
    out.push([radius * Math.cos(phi), zCentre + height * Math.sin(phi)]);
  }
  return out;
}

function polyline(points: [number, number][], close = false): string {
  return points.map(([x, z], i) => `${i === 0 ? 'M' : 'L'}${pt(x, z)}`).join(' ') + (close ? ' Z' : '');
}

/** Largest radius and top of the finite shapes, mm. */
function extent(scene: SceneDescription): { r: number; top: number } {
  let r = 0;
  let top = 0;
  for (const s of scene.surfaces) {
    const sh = s.shape;
    if (sh.kind === 'rect') {
      if (sh.axis === 0) r = Math.max(r, Math.abs(sh.at));
      if (sh.axis === 2) r = Math.max(r, Math.abs(sh.uMin), Math.abs(sh.uMax));
      top = Math.max(top, sh.axis === 2 ? sh.at : sh.vMax);
    } else if (sh.kind === 'disc') {
      if (Number.isFinite(sh.rOuter)) r = Math.max(r, sh.rOuter);
      top = Math.max(top, sh.at);
    } else if (sh.kind === 'cylinder') {
      r = Math.max(r, sh.radius);
      top = Math.max(top, sh.z1);
    } else if (sh.kind === 'frustum') {
      r = Math.max(r, sh.r0, sh.r1);
      top = Math.max(top, sh.z1);
    } else if (sh.kind === 'spheroid-cap') {
      r = Math.max(r, sh.radius);
      top = Math.max(top, sh.zCentre + sh.height);
    } else {
      for (let i = 0; i < sh.r.length; i++) {
        r = Math.max(r, sh.r[i]);
        top = Math.max(top, sh.z[i]);
      }
    }
  }
  return { r, top };
}

/** The shape's cut by the plane y = 0, as SVG path data; null when it does not cross that plane. */
function shapePath(sh: Shape, halfWidth: number): string | null {
  switch (sh.kind) {
    case 'rect':
      if (sh.axis === 1) return null;
      // axis 0: u is y, v is z; axis 2: u is x, v is y
      if (sh.axis === 0) return polyline([[sh.at, sh.vMin], [sh.at, sh.vMax]]);
      return polyline([[sh.uMin, sh.at], [sh.uMax, sh.at]]);
    case 'disc': {
      const outer = Math.min(sh.rOuter, halfWidth);
      if (sh.rInner === 0) return polyline([[-outer, sh.at], [outer, sh.at]]);
      return `${polyline([[-outer, sh.at], [-sh.rInner, sh.at]])} ${polyline([[sh.rInner, sh.at], [outer, sh.at]])}`;
    }
    case 'cylinder':
      return `${polyline([[-sh.radius, sh.z0], [-sh.radius, sh.z1]])} ${polyline([[sh.radius, sh.z0], [sh.radius, sh.z1]])}`;
    case 'frustum':
      return `${polyline([[-sh.r0, sh.z0], [-sh.r1, sh.z1]])} ${polyline([[sh.r0, sh.z0], [sh.r1, sh.z1]])}`;
    case 'spheroid-cap':
      return polyline(capPoints(sh.radius, sh.height, sh.zCentre));
    case 'revolution': {
      const right = Array.from(sh.r, (r, i): [number, number] => [r, sh.z[i]]);
      return `${polyline(right.map(([r, z]): [number, number] => [-r, z]))} ${polyline(right)}`;
    }
  }
}

/**
 * The region a dome, cylinder, cup wall or block top closes over the base plane it stands on (an upward
 * rectangle: a block from z = 0 to its top); null for other flat shapes.
 */
function enclosedRegion(sh: Shape): string | null {
  switch (sh.kind) {
    case 'rect':
      if (sh.axis !== 2 || sh.normalSign !== 1) return null;
      return polyline([[sh.uMin, 0], [sh.uMax, 0], [sh.uMax, sh.at], [sh.uMin, sh.at]], true);
    case 'spheroid-cap':
      return polyline(capPoints(sh.radius, sh.height, sh.zCentre), true);
    case 'cylinder':
      return polyline([[-sh.radius, sh.z0], [sh.radius, sh.z0], [sh.radius, sh.z1], [-sh.radius, sh.z1]], true);
    case 'frustum':
      return polyline([[-sh.r0, sh.z0], [sh.r0, sh.z0], [sh.r1, sh.z1], [-sh.r1, sh.z1]], true);
    default:
      return null;
  }
}

/** The x–z box of the rects among `shapes` (the outer faces of a box shell); null when there are none. */
function rectBox(shapes: Shape[]): string | null {
  let xMin = Infinity;
  let xMax = -Infinity;
  let zMin = Infinity;
  let zMax = -Infinity;
  for (const sh of shapes) {
    if (sh.kind !== 'rect' || sh.axis === 1) continue;
    const [x0, x1, z0, z1] = sh.axis === 0 ? [sh.at, sh.at, sh.vMin, sh.vMax] : [sh.uMin, sh.uMax, sh.at, sh.at];
    xMin = Math.min(xMin, x0);
    xMax = Math.max(xMax, x1);
    zMin = Math.min(zMin, z0);
    zMax = Math.max(zMax, z1);
  }
  if (!(xMax > xMin && zMax > zMin)) return null;
  return polyline([[xMin, zMin], [xMax, zMin], [xMax, zMax], [xMin, zMax]], true);
}

function styleOf(b: Behaviour): StrokeStyle {
  if (b.kind === 'fresnel') return 'interface';
  return b.kind;
}

function behaviourText(b: Behaviour): string {
  switch (b.kind) {
    case 'fresnel':
      return 'interface (Fresnel)';
    case 'textured':
      return `textured interface, scattered fraction ${fmt(b.scatteredFraction)}`;
    case 'mirror':
      return b.mirror.kind === 'reflectance'
        ? `specular mirror, R = ${fmt(b.mirror.reflectance)}`
        : `specular metal, n + ik = ${fmt(b.mirror.n)} + ${fmt(b.mirror.k)}i`;
    case 'diffuse':
      return `diffuse (Lambertian) reflector, R = ${fmt(b.reflectance)}`;
    case 'absorber':
      return 'absorber';
  }
}

function shapeText(sh: Shape): string {
  switch (sh.kind) {
    case 'rect':
      return sh.axis === 2 ? `${mm(sh.uMax - sh.uMin)} × ${mm(sh.vMax - sh.vMin)} at z = ${mm(sh.at)}` : `height ${mm(sh.vMax - sh.vMin)}`;
    case 'disc':
      return Number.isFinite(sh.rOuter)
        ? `${sh.rInner > 0 ? `radius ${mm(sh.rInner)} to ` : 'radius '}${mm(sh.rOuter)} at z = ${mm(sh.at)}`
        : `plane z = ${mm(sh.at)}`;
    case 'cylinder':
      return `radius ${mm(sh.radius)}, z ${mm(sh.z0)} to ${mm(sh.z1)}`;
    case 'frustum':
      return `radius ${mm(sh.r0)} at z = ${mm(sh.z0)} to ${mm(sh.r1)} at z = ${mm(sh.z1)}`;
    case 'spheroid-cap':
      return `base radius ${mm(sh.radius)}, height ${mm(sh.height)}, on z = ${mm(sh.zCentre)}`;
    case 'revolution':
      return `profile of ${sh.r.length} points, radius up to ${mm(Math.max(...sh.r))}`;
  }
}

/** One legend line per surface behaviour in drawing order; side faces of one chip share a line. */
function strokeOf(s: SceneSurface, halfWidth: number): SectionStroke | null {
  const d = shapePath(s.shape, halfWidth);
  if (d === null) return null;
  return { surface: s.name, style: styleOf(s.behaviour), d, title: `${s.name}: ${shapeText(s.shape)}; ${behaviourText(s.behaviour)}` };
}

/** The cross-section of a scene (see the file comment). */
export function packageSection(scene: SceneDescription): PackageSection {
  const { r, top } = extent(scene);
  // the endless base plane is drawn a little beyond the widest part
  const halfWidth = r * 1.15;
  const media: SectionLegendMedium[] = [];
  const colourOf = new Map<string, number>();
  for (const m of scene.media) {
    if (m.role === 'outside') continue;
    colourOf.set(m.name, media.length);
    const thick = m.box ? `, ${mm(m.box.z1 - m.box.z0)} thick, ${mm(2 * m.box.a)} × ${mm(2 * m.box.b)}` : '';
    const loss = m.absorptionPerMm > 0 ? `, α = ${fmt(m.absorptionPerMm)} /mm` : '';
    const phosphor = m.phosphor ? `, holds the phosphor (quantum yield ${fmt(m.phosphor.quantumYield)})` : '';
    media.push({ name: m.name, colour: media.length, text: `${m.name}: n = ${index(m.n)}${loss}${thick}${phosphor}` });
  }
  const regions: SectionRegion[] = [];
  const roleOf = (m: SceneDescription['media'][number]): SectionRegion['role'] => (m.role === 'chip' ? 'chip' : m.phosphor ? 'phosphor' : 'encapsulant');
  // enclosing solids first (the encapsulant), then media of flat faces only, then the chip's boxes on top
  for (const s of scene.surfaces) {
    const medium = scene.media.find((m) => m.name === s.behind);
    const d = enclosedRegion(s.shape);
    if (!medium || medium.role === 'outside' || d === null || medium.box) continue;
    regions.push({ medium: medium.name, role: roleOf(medium), colour: colourOf.get(medium.name) ?? 0, d, title: media[colourOf.get(medium.name) ?? 0].text });
  }
  for (const m of scene.media) {
    if (m.role === 'outside' || m.box || regions.some((r) => r.medium === m.name)) continue;
    const d = rectBox(scene.surfaces.filter((s) => s.behind === m.name).map((s) => s.shape));
    if (d !== null) regions.push({ medium: m.name, role: roleOf(m), colour: colourOf.get(m.name) ?? 0, d, title: media[colourOf.get(m.name) ?? 0].text });
  }
  for (const m of scene.media) {
    if (!m.box) continue;
    const { a, z0, z1 } = m.box;
    regions.push({
      medium: m.name,
      role: 'chip',
      colour: colourOf.get(m.name) ?? 0,
      d: polyline([[-a, z0], [a, z0], [a, z1], [-a, z1]], true),
      title: media[colourOf.get(m.name) ?? 0].text
    });
  }
  const strokes = scene.surfaces.map((s) => strokeOf(s, halfWidth)).filter((s): s is SectionStroke => s !== null);
  const styles = [...new Set(strokes.map((s) => s.style))];

  const emitterMedium = scene.media.find((m) => m.name === scene.emitter.medium);
  const box = emitterMedium?.box ?? { a: 0, b: 0, z0: 0, z1: 0 };
  const volume = scene.emitter.mode === 'volume';
  const emitter = volume
    ? { d: polyline([[-box.a, box.z0], [box.a, box.z0], [box.a, box.z1], [-box.a, box.z1]], true), volume, title: `emitting volume: the whole ${scene.emitter.medium} layer` }
    : { d: polyline([[-box.a, scene.emitter.z], [box.a, scene.emitter.z]]), volume, title: `emitting plane at z = ${mm(scene.emitter.z)} in ${scene.emitter.medium}` };

  const margin = Math.max(top, halfWidth) * 0.06;
  return {
    viewBox: [-halfWidth - margin, -top - margin, 2 * (halfWidth + margin), top + 2 * margin],
    regions,
    strokes,
    emitter,
    media,
    styles,
    sizeMm: { width: 2 * r, height: top }
  };
}

/** A traced ray's path for the overlay: its points (x, y, z in mm) and the ledger bin it ended in. */
export interface SectionRayPath {
  points: readonly (readonly [number, number, number])[];
  fate: string;
}

export type RayFateClass = 'escaped' | 'medium' | 'surface' | 'lost';

/** Ray paths projected onto the x–z plane, with the kind of their fate for the colour. */
export function sectionRays(paths: readonly SectionRayPath[]): { d: string; fate: RayFateClass; title: string }[] {
  return paths
    .filter((p) => p.points.length > 1)
    .map((p) => {
      const kind = p.fate.slice(0, p.fate.indexOf(':')) as RayFateClass;
      return {
        d: polyline(p.points.map(([x, , z]) => [x, z] as [number, number])),
        fate: (['escaped', 'medium', 'surface', 'lost'] as const).includes(kind) ? kind : 'lost',
        title: p.fate
      };
    });
}

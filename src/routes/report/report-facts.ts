/**
 * What the report prints about the scenario, as plain rows (label, value) built from the scenario and
 * its resolved indices, plus the closed-form results and the report's fixed assumptions and cautions.
 * Pure apart from its $lib imports; the page only lays these out.
 */
import { fmtNumber, fmtPercent, fmtPlain, fmtUnit } from '$lib/format/format';
import { domeEstimate, escapeCone } from '$lib/optics';
import type { ResolvedScenario } from '$lib/scenario/resolve';
import type { Scenario } from '$lib/scenario/schema';

export type FactRow = [label: string, value: string];

export function scenarioRows(s: Scenario, r: ResolvedScenario): FactRow[] {
  const e = s.emission;
  const emission =
    e.kind === 'single'
      ? `${fmtPlain(e.wavelengthNm)} nm`
      : e.kind === 'gaussian'
        ? `Gaussian band, peak ${fmtPlain(e.peakNm)} nm, FWHM ${fmtPlain(e.fwhmNm)} nm`
        : `tabulated spectrum, ${e.rows.length} rows (design wavelength ${fmtPlain(r.wavelengthNm)} nm)`;
  const c = s.chip;
  const enc = s.encapsulant;
  const base = r.base.kind === 'reflectance' ? `specular, reflectance ${fmtPercent(r.base.reflectance, 3)}` : `${r.base.label}, n ${fmtNumber(r.base.n, 4)} + ${fmtNumber(r.base.k, 4)}i`;
  const rows: FactRow[] = [
    ['Emission', emission],
    ['Chip', `${r.chip.label}, n ${fmtNumber(r.chip.n, 4)} at ${fmtPlain(r.wavelengthNm)} nm`],
    ['Chip size', `${fmtPlain(c.widthMm)} × ${fmtPlain(c.lengthMm)} × ${fmtPlain(c.heightMm)} mm, emitting ${c.emission === 'plane' ? `plane at ${fmtPlain(c.emitterZMm)} mm` : 'through its volume'}`],
    ['Chip absorption', `${fmtPlain(c.absorptionPerMm)} /mm`],
    ['Base', base]
  ];
  if (enc.shape === 'none') rows.push(['Encapsulant', 'none (bare chip)']);
  else {
    rows.push(
      ['Encapsulant', `${r.encapsulant.label}, n ${fmtNumber(r.encapsulant.n, 4)}, absorption ${fmtPlain(enc.absorptionPerMm)} /mm`],
      ['Encapsulant shape', enc.shape === 'box'
        ? `square box, ${fmtPlain(2 * enc.radiusMm)} × ${fmtPlain(2 * enc.radiusMm)} mm, height ${fmtPlain(enc.heightMm)} mm`
        : `${enc.shape === 'dome' ? 'dome' : 'cylinder'}, radius ${fmtPlain(enc.radiusMm)} mm, height ${fmtPlain(enc.heightMm)} mm`]
    );
  }
  rows.push(['Outside medium', `${r.outside.label}, n ${fmtNumber(r.outside.n, 4)}`]);
  rows.push(['Trace settings', `${s.trace.rays.toLocaleString('en')} rays, seed ${s.trace.seed}, polarisation ${s.trace.polarization === 'average' ? 'averaged' : 'tracked'}`]);
  return rows;
}

/** Closed-form results: escape cones into the outside and the encapsulant, and the dome estimate. */
export function closedFormRows(s: Scenario, r: ResolvedScenario): FactRow[] {
  const bare = escapeCone(r.chip.n, r.outside.n);
  const rows: FactRow[] = [
    ['Critical angle, chip → outside', `${fmtNumber((bare.criticalAngleRad * 180) / Math.PI, 4)}°`],
    ['Escape cone, one face, geometric', fmtPercent(bare.geometric, 4)],
    ['Escape cone, one face, Fresnel-weighted', fmtPercent(bare.fresnel, 4)]
  ];
  if (s.encapsulant.shape !== 'none') {
    const d = domeEstimate({
      nChip: r.chip.n,
      nEnc: r.encapsulant.n,
      nOut: r.outside.n,
      chipWidthMm: s.chip.widthMm,
      chipLengthMm: s.chip.lengthMm,
      radiusMm: s.encapsulant.radiusMm
    });
    rows.push(
      ['Under a dome of the encapsulant, one face', fmtPercent(d.etaDome, 4)],
      ['Dome gain, ideal one-face reference', fmtUnit(d.gain, '×', 4)],
      ['No-TIR dome radius (no total internal reflection): half-diagonal × encapsulant index ÷ outside index', fmtUnit(d.minRadiusNoTirMm, 'mm', 4)],
      ['Scenario dome large enough for no TIR', d.noTir ? 'yes' : 'no: light from the corners is trapped']
    );
  }
  return rows;
}

export const ASSUMPTIONS: readonly string[] = [
  'Geometric optics: no interference in thick parts, no scattering, no phosphor; specular surfaces.',
  'Isotropic emission inside the chip; unpolarised light, Fresnel reflection decided at each interface.',
  'Closed forms: a point-like chip face under a large hemispherical dome, single pass; a cuboid chip sums one escape cone per face while the cones do not overlap (critical angle below 45°).',
  'Flat layers never widen the escape cone: n·sin θ is conserved through parallel layers.',
  'Monte Carlo results carry their binomial standard error √(p(1 − p)/N); differences below about 3 standard errors are noise.',
  'Indices come from the material library at the design wavelength, each with its source and validity range.'
];

/**
 * The assumptions, with one line per user material in the scenario: its numbers are as the user
 * entered them, not the library's published ones.
 */
export function assumptions(s: Scenario, r: ResolvedScenario): string[] {
  const parts: [string, ResolvedScenario['chip'], boolean][] = [
    ['chip', r.chip, true],
    ['encapsulant', r.encapsulant, s.encapsulant.shape !== 'none'],
    ['outside medium', r.outside, true]
  ];
  const own = parts
    .filter(([, m, used]) => used && m.user && m.material)
    .map(([part, m]) => `The ${part} is the user's own material ${m.material!.name} (source given: ${m.material!.source}); its index is as entered, not checked against a published source.`);
  return [...ASSUMPTIONS, ...own];
}

/** Cautions: eye safety, the encapsulant's temperature limit when the library lists one, and estimates. */
export function cautions(s: Scenario, r: ResolvedScenario): string[] {
  const out = [
    'Eye safety: bright LEDs, blue ones above all, can injure the retina. Photobiological safety is assessed under IEC 62471; the risk group depends on radiance and exposure time. Do not look into a lit package at close range.'
  ];
  const m = s.encapsulant.shape !== 'none' ? r.encapsulant.material : null;
  if (m?.maxServiceTempC !== undefined) {
    out.push(`Heat: ${m.name} is rated for continuous service up to about ${m.maxServiceTempC} °C (common practice); above it encapsulants yellow, crack or delaminate. These optical figures say nothing about junction or encapsulant temperature.`);
  } else {
    out.push('Heat: encapsulants yellow, crack or delaminate when run above their rated temperature; check the maker’s limit. These optical figures say nothing about junction or encapsulant temperature.');
  }
  out.push('These are estimates — verify with measurements and follow local codes and licensed practice.');
  return out;
}

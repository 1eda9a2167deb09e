import { describe, expect, it } from 'vitest';
import { DEMO_SCENARIO, demoScenario } from '../../../src/lib/scenario/defaults';
import { LIMITS, checkNumber, rangeMessage } from '../../../src/lib/scenario/limits';
import { assertScenario, parseScenario, type Scenario } from '../../../src/lib/scenario/schema';

function withEdit(edit: (s: Scenario) => void): Scenario {
  const s = demoScenario();
  edit(s);
  return s;
}

function messages(input: unknown): string[] {
  const r = parseScenario(input);
  return r.ok ? [] : r.issues.map((i) => i.message);
}

describe('parseScenario', () => {
  it('parseScenario(DEMO_SCENARIO) accepts the demo scenario unchanged', () => {
    const r = parseScenario(DEMO_SCENARIO);
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.scenario).toEqual(DEMO_SCENARIO);
  });

  it('the demo is a 1 × 1 × 0.15 mm GaN chip at 450 nm under a 2.5 mm methyl silicone hemisphere', () => {
    expect(DEMO_SCENARIO.chip).toMatchObject({ medium: { kind: 'material', id: 'gan' }, widthMm: 1, lengthMm: 1, heightMm: 0.15 });
    expect(DEMO_SCENARIO.emission).toEqual({ kind: 'single', wavelengthNm: 450 });
    expect(DEMO_SCENARIO.encapsulant).toMatchObject({ medium: { kind: 'material', id: 'silicone-methyl' }, shape: 'dome', radiusMm: 2.5, heightMm: 2.5 });
    expect(Object.isFrozen(DEMO_SCENARIO.chip)).toBe(true);
  });

  it.each([
    ['wavelength below range', (s: Scenario) => (s.emission = { kind: 'single', wavelengthNm: 199.9 }), 'Wavelength must be between 200 and 2500 nm.'],
    ['wavelength NaN', (s: Scenario) => (s.emission = { kind: 'single', wavelengthNm: NaN }), 'Wavelength must be between 200 and 2500 nm.'],
    ['chip width 0', (s: Scenario) => (s.chip.widthMm = 0), 'Chip width must be between 0.001 and 1000 mm.'],
    ['chip height Infinity', (s: Scenario) => (s.chip.heightMm = Infinity), 'Chip height must be between 0.001 and 1000 mm.'],
    ['negative absorption', (s: Scenario) => (s.chip.absorptionPerMm = -1), 'Chip absorption must be between 0 and 1000 1/mm.'],
    ['reflectance above 1', (s: Scenario) => (s.base = { kind: 'reflectance', reflectance: 1.01 }), 'Base reflectance must be between 0 and 1.'],
    ['typed index 0', (s: Scenario) => (s.outside = { kind: 'index', n: 0, k: 0 }), 'Outside medium index n must be between 1 and 6.'],
    ['typed k negative', (s: Scenario) => (s.chip.medium = { kind: 'index', n: 2.5, k: -0.1 }), 'Chip extinction k must be between 0 and 10.'],
    ['rays not whole', (s: Scenario) => (s.trace.rays = 1500.5), 'Rays must be a whole number between 1000 and 20000000 rays.'],
    ['rays too many', (s: Scenario) => (s.trace.rays = 3e7), 'Rays must be a whole number between 1000 and 20000000 rays.'],
    ['seed negative', (s: Scenario) => (s.trace.seed = -1), 'Seed must be a whole number between 0 and 4294967295.'],
    ['FWHM zero', (s: Scenario) => (s.emission = { kind: 'gaussian', peakNm: 450, fwhmNm: 0 }), 'Spectral width (FWHM) must be between 1 and 500 nm.']
  ])('rejects %s with a message naming the field and range', (_name, edit, message) => {
    expect(messages(withEdit(edit))).toContain(message);
  });

  it('a string where a number belongs gets the same range message (no coercion of "2.5")', () => {
    const s = withEdit((d) => ((d.chip as unknown as Record<string, unknown>).widthMm = '2.5'));
    expect(messages(s)).toEqual(['Chip width must be between 0.001 and 1000 mm.']);
  });

  it('rejects an emitter above the top of the chip, naming the chip height', () => {
    expect(messages(withEdit((s) => (s.chip.emitterZMm = 0.2)))).toEqual([
      'Emitter height must be between 0 and the chip height (0.15 mm).'
    ]);
  });

  // Fit of the chip in a dome (upper half of the spheroid x²/R² + y²/R² + z²/h² = 1): the top corner
  // (ρ, H) is inside when ρ²/R² + H²/h² < 1 (exact identity; the tracer's own check uses the same rule).
  it('rejects a chip whose top corners stick out of the dome, and accepts one just inside', () => {
    // 5 × 1 chip: ρ = hypot(2.5, 0.5) = 2.5495 mm > R = 2.5 mm.
    // ρ/√(1 − H²/h²) = 2.554 mm, shown rounded up so a radius at the shown bound fits
    expect(messages(withEdit((s) => (s.chip.widthMm = 5)))[0]).toMatch(/^Encapsulant radius must be more than 2\.56 mm/);
    // 4 × 1 chip: ρ = 2.0616, H = 0.15, R = h = 2.5 → ρ²/R² + H²/h² = 0.6836 < 1: fits.
    expect(parseScenario(withEdit((s) => (s.chip.widthMm = 4))).ok).toBe(true);
  });

  it('a cylinder must be wider than the chip half-diagonal and taller than the chip', () => {
    const narrow = withEdit((s) => Object.assign(s.encapsulant, { shape: 'cylinder', radiusMm: 0.7, heightMm: 1 }));
    expect(messages(narrow)[0]).toMatch(/half-diagonal \(0\.708 mm\)/); // √2/2 = 0.7071 mm for a 1 × 1 mm chip, shown rounded up
    const low = withEdit((s) => Object.assign(s.encapsulant, { shape: 'cylinder', radiusMm: 2, heightMm: 0.1 }));
    expect(messages(low)[0]).toMatch(/^Encapsulant height must be more than the chip height \(0\.15 mm\)/);
  });

  it('ignores the encapsulant size when there is no encapsulant (but still range-checks it)', () => {
    expect(parseScenario(withEdit((s) => Object.assign(s.encapsulant, { shape: 'none', radiusMm: 0.01, heightMm: 0.01 }))).ok).toBe(true);
  });

  it('material ids must exist in the library, and the base metal must be a metal', () => {
    expect(messages(withEdit((s) => (s.chip.medium = { kind: 'material', id: 'unobtainium' })))).toEqual([
      "Chip material 'unobtainium' is not in the material library."
    ]);
    expect(messages(withEdit((s) => (s.base = { kind: 'metal', id: 'gan' })))).toEqual([
      "Base metal must be a metal; 'gan' is not."
    ]);
    expect(messages(withEdit((s) => (s.outside = { kind: 'material', id: 'ag' })))[0]).toMatch(/must be a non-metal/);
    expect(parseScenario(withEdit((s) => (s.base = { kind: 'metal', id: 'ag' }))).ok).toBe(true);
  });

  it('rejects a material written by name instead of id (ids are exact)', () => {
    expect(messages(withEdit((s) => (s.chip.medium = { kind: 'material', id: 'GaN' })))).toEqual([
      'Chip material must be a material id from the library.'
    ]);
  });

  it('a tabulated spectrum needs increasing wavelengths and some weight', () => {
    const table = (rows: [number, number][]) => withEdit((s) => (s.emission = { kind: 'table', rows }));
    expect(parseScenario(table([[440, 0.5], [450, 1], [460, 0.5]])).ok).toBe(true);
    expect(messages(table([[450, 1], [440, 1]]))).toEqual(['Spectrum wavelengths must increase from row to row (row 2 does not).']);
    expect(messages(table([[440, 0], [450, 0]]))).toEqual(['Spectrum weights must not all be zero.']);
    expect(messages(table([[450, 1]]))).toEqual(['Number of spectrum rows must be a whole number between 2 and 2000 rows.']);
  });

  it('rejects unknown fields and a missing version', () => {
    expect(parseScenario({ ...demoScenario(), colour: 'blue' }).ok).toBe(false);
    const noVersion: Record<string, unknown> = demoScenario();
    delete noVersion.version;
    expect(messages(noVersion)).toContain('Scenario version must be 4.');
  });

  it('reports issue paths as dotted strings', () => {
    const r = parseScenario(withEdit((s) => (s.encapsulant.absorptionPerMm = -2)));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.issues[0].path).toBe('encapsulant.absorptionPerMm');
  });

  it('assertScenario throws a RangeError with the first message', () => {
    expect(() => assertScenario(withEdit((s) => (s.chip.lengthMm = 2000)))).toThrow(
      new RangeError('Chip length must be between 0.001 and 1000 mm.')
    );
    expect(assertScenario(DEMO_SCENARIO)).toEqual(DEMO_SCENARIO);
  });

  it('never throws on junk input', () => {
    for (const junk of [null, undefined, 42, 'text', [], { version: 1 }, { version: 1, chip: null }]) {
      expect(parseScenario(junk).ok).toBe(false);
    }
  });
});

describe('limits', () => {
  it('checkNumber(field, limit, x) accepts the closed range and rejects NaN, ±Infinity and non-numbers', () => {
    const L = LIMITS.sizeMm;
    expect(checkNumber('Size', L, L.min)).toBeNull();
    expect(checkNumber('Size', L, L.max)).toBeNull();
    for (const bad of [NaN, Infinity, -Infinity, L.min / 2, L.max * 2, '1', null]) {
      expect(checkNumber('Size', L, bad)).toBe('Size must be between 0.001 and 1000 mm.');
    }
    expect(checkNumber('Rays', LIMITS.rays, 1000.5)).toBe(rangeMessage('Rays', LIMITS.rays));
  });
});

describe('parseScenario, version 4 package bodies', () => {
  const layered = () => {
    const s = demoScenario();
    s.chip = {
      ...s.chip,
      heightMm: 0.155,
      emitterZMm: 0.0025,
      layers: [
        { name: 'GaN', medium: { kind: 'material', id: 'gan' }, thicknessMm: 0.005, absorptionPerMm: 0.5 },
        { name: 'sapphire', medium: { kind: 'index', n: 1.78 }, thicknessMm: 0.15, absorptionPerMm: 0 }
      ],
      emitLayer: 0
    };
    return s;
  };
  const first = (x: unknown) => {
    const r = parseScenario(x);
    return r.ok ? null : r.issues[0];
  };

  it('accepts a layered chip with a typed and a library layer', () => {
    expect(first(layered())).toBeNull();
  });

  it('names the layer and its range: a layer of zero thickness, an unknown layer material, a repeated name', () => {
    const thin = layered();
    thin.chip.layers![1].thicknessMm = 0;
    expect(first(thin)).toEqual({ path: 'chip.layers.1.thicknessMm', message: 'Chip layer 2 thickness must be between 0.001 and 1000 mm.' });
    const unknown = layered();
    unknown.chip.layers![0].medium = { kind: 'material', id: 'unobtainium' };
    expect(first(unknown)?.message).toBe("Chip layer 1 material 'unobtainium' is not in the material library.");
    const twice = layered();
    twice.chip.layers![1].name = 'GaN';
    expect(first(twice)?.path).toBe('chip.layers.1.name');
  });

  it('a reflectance of a cup wall or chip mirror outside [0, 1] names the field', () => {
    const s = demoScenario();
    s.body = { kind: 'cup', floorRadiusMm: 1.3, topRadiusMm: 1.5, depthMm: 0.8, wallFinish: 'diffuse', wallReflectance: 1.1 };
    s.encapsulant.shape = 'flat';
    expect(first(s)?.message).toBe('Cup wall reflectance must be between 0 and 1.');
    const m = demoScenario();
    m.chip.mirror = { kind: 'reflectance', reflectance: -0.1 };
    expect(first(m)?.message).toBe('Chip mirror reflectance must be between 0 and 1.');
  });
});

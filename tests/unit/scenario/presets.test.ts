import { describe, expect, it } from 'vitest';
import { packagePresets } from '../../../src/lib/scenario/presets';
import { parseScenario } from '../../../src/lib/scenario/schema';
import { DEMO_SCENARIO } from '../../../src/lib/scenario/defaults';
import { toTracePackage } from '../../../src/lib/scenario/resolve';
import { validateTracePackage } from '../../../src/lib/trace/package-spec';

describe('packagePresets()', () => {
  it('offers the demo first, unchanged, then the mid-power cup and the chip-scale package', () => {
    const presets = packagePresets();
    expect(presets.map((p) => p.id)).toEqual(['demo-dome', 'mid-power-cup', 'chip-scale']);
    expect(presets[0].scenario).toEqual(DEMO_SCENARIO);
  });

  it('every preset passes the scenario schema and the tracer edge check', () => {
    for (const p of packagePresets()) {
      const r = parseScenario(p.scenario);
      expect(r.ok, `${p.id}: ${r.ok ? '' : r.issues[0].message}`).toBe(true);
      expect(() => validateTracePackage(toTracePackage(p.scenario))).not.toThrow();
    }
  });

  it('the mid-power cup: 2.6 mm floor, 3.0 mm rim, 0.8 mm deep, diffuse wall 0.93, silvered floor 0.95, flip chip, flat fill', () => {
    const pkg = toTracePackage(packagePresets()[1].scenario);
    expect(pkg.body).toEqual({ kind: 'cup', floorRadiusMm: 1.3, topRadiusMm: 1.5, depthMm: 0.8, wallFinish: 'diffuse', wallReflectance: 0.93, fill: 'flat' });
    expect(pkg.base).toEqual({ kind: 'reflectance', reflectance: 0.95 });
    expect(pkg.chip.layers?.map((l) => l.name)).toEqual(['GaN', 'sapphire']);
    expect(pkg.chip.mirror).toEqual({ kind: 'reflectance', reflectance: 0.95 });
    // sapphire, ordinary ray, 450 nm: n ≈ 1.78 (Malitson & Dodge, JOSA 62, 1405 (1972)); GaN ≈ 2.45 ± 0.05 (Barker & Ilegems 1973)
    expect(pkg.chip.layers![1].n).toBeCloseTo(1.78, 1);
    expect(Math.abs(pkg.chip.layers![0].n - 2.45)).toBeLessThan(0.06);
  });

  it('presets are fresh copies: editing one does not change the next call', () => {
    packagePresets()[1].scenario.chip.widthMm = 0.5;
    expect(packagePresets()[1].scenario.chip.widthMm).toBe(1);
  });
});

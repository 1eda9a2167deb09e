import { describe, expect, it } from 'vitest';
import { formatRayFile, packageEscapingRays, parseRayFile, RAY_FILE_HEADER, runOptic } from '../../../src/lib/optic-trace';
import { demoScenario, resolveScenario, toTracePackage } from '../../../src/lib/scenario';

describe('ray file', () => {
  it('writes and reads back rays, naming the scenario', () => {
    // x, y, z, dx, dy, dz, wavelength (NaN: the file's wavelength)
    const pd = Float64Array.of(0.1, -0.2, 0.3, 0, 0.6, 0.8, NaN, 1, 2, 3, 1, 0, 0, 590);
    const text = formatRayFile(pd, 2, 450, 'Demo one');
    expect(text.split('\n')[1]).toBe(RAY_FILE_HEADER);
    const list = parseRayFile(text);
    expect(list.count).toBe(2);
    expect(list.scenario).toBe('Demo one');
    // the weight-averaged wavelength of the two rays
    expect(list.wavelengthNm).toBe(520);
    expect(Array.from(list.rays.slice(0, 7))).toEqual([0.1, -0.2, 0.3, 0, 0.6, 0.8, 1]);
    expect(text.split('\n')[3].split(',')[6]).toBe('590');
  });

  it('refuses bad rows in one line naming the row and field', () => {
    const head = `# x\n${RAY_FILE_HEADER}\n`;
    expect(() => parseRayFile('x,y\n1,2')).toThrow(/row 1: the header/);
    expect(() => parseRayFile(head + '0,0,0,0,0,1,450')).toThrow(/row 3: needs 8 values/);
    expect(() => parseRayFile(head + '0,0,zero,0,0,1,450,1')).toThrow(/row 3, field z_mm/);
    expect(() => parseRayFile(head + '0,0,0,0,0,0,450,1')).toThrow(/row 3, field dx,dy,dz/);
    expect(() => parseRayFile(head + '0,0,0,0,0,1,50,1')).toThrow(/row 3, field wavelength_nm/);
    expect(() => parseRayFile(head + '0,0,0,0,0,1,450,-1')).toThrow(/row 3, field weight/);
    expect(() => parseRayFile(head)).toThrow(/no rays/);
    for (const bad of ['x,y\n1,2', head + '0,0,zero,0,0,1,450,1']) {
      try {
        parseRayFile(bad);
      } catch (e) {
        expect((e as Error).message).not.toContain('\n');
      }
    }
  });

  it("the package's escaping rays, saved and loaded, feed an optic like the package itself (within 4σ)", () => {
    const scenario = demoScenario();
    const pkg = toTracePackage(scenario, resolveScenario(scenario));
    const { positionsDirections, count, launched } = packageEscapingRays(pkg, 40_000, 9);
    expect(count).toBeGreaterThan(0);
    expect(count).toBeLessThan(launched);
    // every recorded ray leaves from the package's outline (the dome, r ≤ 2.5 mm) with a unit direction
    for (let i = 0; i < count; i += 97) {
      const o = 7 * i; // x, y, z, dx, dy, dz, wavelength
      expect(Math.hypot(positionsDirections[o], positionsDirections[o + 1], positionsDirections[o + 2])).toBeLessThan(2.5 + 1e-6);
      expect(Math.hypot(positionsDirections[o + 3], positionsDirections[o + 4], positionsDirections[o + 5])).toBeCloseTo(1, 9);
    }
    const list = parseRayFile(formatRayFile(positionsDirections, count, 450, scenario.name, '', pkg.chip.heightMm));
    expect(list.sourcePlaneMm).toBe(0.15);
    const design = { type: 'lens' as const, exitDiameterMm: 20, heightMm: 12, material: 'pmma' };
    const fromFile = runOptic({ design, source: { kind: 'rays', list }, rays: 20_000, seed: 2 }).results;
    const direct = runOptic({ design, source: { kind: 'package', pkg, wavelengthNm: 450, scenario: scenario.name }, rays: 50_000, seed: 2 }).results;
    // the same light into the same lens: the share of the package's light that leaves through the exit agrees
    const pFile = fromFile.ledger.out / fromFile.sourceFraction;
    const pPkg = direct.ledger.out / direct.sourceFraction;
    const s = Math.sqrt((pFile * (1 - pFile)) / 20_000 + (pPkg * (1 - pPkg)) / (50_000 * direct.sourceFraction));
    // + 0.01: in the joint scene, light the lens turns back can be absorbed in the package (the file has no package)
    expect(Math.abs(pFile - pPkg)).toBeLessThan(4 * s + 0.01);
  });
});

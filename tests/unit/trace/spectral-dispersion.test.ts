import { describe, expect, it } from 'vitest';
import { demoScenario } from '../../../src/lib/scenario/defaults';
import { resolveScenario, scenarioDispersion, toTracePackage, withDispersion } from '../../../src/lib/scenario';
import { withPhosphor } from '../../../src/lib/trace/white-light';
import { traceSync } from '../../../src/lib/trace/trace';
import type { Scenario } from '../../../src/lib/scenario';

// A phosphor that does nothing (μs = μa = 0): the rays carry their wavelength, and no number is drawn
// for a particle event or for the line's wavelength, so the random stream is the monochromatic one
const clearTable = { kind: 'table' as const, coefficients: [[300, 0, 0, 0]] as [number, number, number, number][], emission: [[550, 1]] as [number, number][], quantumYield: 1 };
/** The ledger without the (empty) phosphor heat bin the spectral scene adds. */
const ledger = (parts: Record<string, number>) => Object.fromEntries(Object.entries(parts).filter(([k]) => !k.startsWith('phosphor:')));
const at = (nm: number): Scenario => ({ ...demoScenario(), emission: { kind: 'single', wavelengthNm: nm } });

describe('per-ray dispersion in spectral scenes', () => {
  it('GaN index rows follow the library: n(450 nm) = 2.4869 (A. S. Barker, M. Ilegems, Phys. Rev. B 7, 743 (1973), computed) and fall with wavelength (normal dispersion)', () => {
    const d = scenarioDispersion(at(450));
    const gan = d.chipLayers![0]!;
    const n450 = gan.find(([nm]) => nm === 450)![1];
    expect(n450).toBeCloseTo(2.4869, 3);
    const n630 = gan.find(([nm]) => nm === 630)![1];
    expect(n630).toBeLessThan(n450 - 0.05);
    // the critical angle GaN → methyl silicone differs between a blue and a red ray
    const sil = d.encapsulant!;
    const thetaC = (nm: number) => Math.asin(sil.find(([w]) => w === nm)![1] / gan.find(([w]) => w === nm)![1]);
    expect(thetaC(630) - thetaC(450)).toBeGreaterThan(0.01);
  });

  it('a line at 450 nm and one at 630 nm, traced with spectral rays, give bit for bit the monochromatic trace with every index at that wavelength — and differ from each other', () => {
    const rays = 8000;
    const seed = 4;
    const spectralAt = (nm: number) => {
      // indices from the 450 nm scenario's rows: the rays pick theirs at their own wavelength
      const base = at(450);
      const pkg = withPhosphor(withDispersion(toTracePackage(base), base, resolveScenario(base)), clearTable, [[nm, 1]]);
      return traceSync(pkg, { rays, seed });
    };
    const monoAt = (nm: number) => traceSync(toTracePackage(at(nm)), { rays, seed });
    const s450 = spectralAt(450);
    const s630 = spectralAt(630);
    expect(s450.parts['phosphor:encapsulant']).toBe(0);
    expect(ledger(s450.parts)).toEqual(monoAt(450).parts);
    expect(ledger(s630.parts)).toEqual(monoAt(630).parts);
    expect(s630.escaped).not.toBe(s450.escaped);
  });

  it('without dispersion rows the spectral trace keeps the design index for every wavelength', () => {
    const pkg = withPhosphor(toTracePackage(at(450)), clearTable, [[630, 1]]);
    expect(ledger(traceSync(pkg, { rays: 3000, seed: 2 }).parts)).toEqual(traceSync(toTracePackage(at(450)), { rays: 3000, seed: 2 }).parts);
  });
});

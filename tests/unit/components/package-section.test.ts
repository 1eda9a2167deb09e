import { describe, expect, it } from 'vitest';
import { packageSection, sectionRays } from '../../../src/lib/components/package-section';
import { packagePresets } from '../../../src/lib/scenario/presets';
import { toTracePackage } from '../../../src/lib/scenario/resolve';
import { packageScene } from '../../../src/lib/trace/package-scene';

const [demo, cup, csp] = packagePresets().map((p) => packageScene(toTracePackage(p.scenario)));

/** Every number in an SVG path string. */
function numbers(d: string): number[] {
  return (d.match(/-?\d+(\.\d+)?(e-?\d+)?/g) ?? []).map(Number);
}

describe('packageSection(scene)', () => {
  it('draws the demo to scale: the dome is a half ellipse of radius 2.5 mm over the base, the chip a 1 × 0.15 mm box', () => {
    const s = packageSection(demo);
    const dome = s.strokes.find((x) => x.surface === 'dome')!;
    const xs = numbers(dome.d).filter((_, i) => i % 2 === 0);
    const ys = numbers(dome.d).filter((_, i) => i % 2 === 1);
    expect(Math.min(...xs)).toBeCloseTo(-2.5, 9);
    expect(Math.max(...xs)).toBeCloseTo(2.5, 9);
    expect(Math.min(...ys)).toBeCloseTo(-2.5, 9); // apex at z = 2.5 (SVG y = −z)
    const chip = s.regions.find((r) => r.medium === 'chip')!;
    expect(numbers(chip.d)).toEqual([-0.5, 0, 0.5, 0, 0.5, -0.15, -0.5, -0.15]);
    expect(s.regions[0]).toMatchObject({ medium: 'encapsulant', role: 'encapsulant' });
    expect(s.sizeMm).toEqual({ width: 5, height: 2.5 });
    expect(s.emitter.title).toBe('emitting plane at z = 0.14 mm in chip');
  });

  it('comes from the scene description: every surface that cuts the x–z plane is drawn, ±y faces are not', () => {
    const s = packageSection(cup);
    const cutting = cup.surfaces.filter((x) => !(x.shape.kind === 'rect' && x.shape.axis === 1)).map((x) => x.name);
    expect(s.strokes.map((x) => x.surface)).toEqual(cutting);
    expect(s.strokes.some((x) => x.surface.endsWith('+y'))).toBe(false);
  });

  it('the mid-power cup: wall diffuse (dashed), floor and chip mirror specular, the cup trapezoid filled with the encapsulant', () => {
    const s = packageSection(cup);
    const style = (name: string) => s.strokes.find((x) => x.surface === name)?.style;
    expect(style('wall')).toBe('diffuse');
    expect(style('floor')).toBe('mirror');
    expect(style('chip mirror')).toBe('mirror');
    expect(style('cup top')).toBe('interface');
    const fill = s.regions.find((r) => r.role === 'encapsulant')!;
    // floor radius 1.3 at z = 0, rim radius 1.5 at z = 0.8
    expect(numbers(fill.d)).toEqual([-1.3, 0, 1.3, 0, 1.5, -0.8, -1.5, -0.8]);
    expect(s.regions.filter((r) => r.role === 'chip').map((r) => r.medium)).toEqual(['GaN', 'sapphire']);
    expect(s.styles).toEqual(expect.arrayContaining(['mirror', 'diffuse', 'interface']));
    expect(s.strokes.find((x) => x.surface === 'wall')!.title).toBe('wall: radius 1.3 mm at z = 0 mm to 1.5 mm at z = 0.8 mm; diffuse (Lambertian) reflector, R = 0.93');
  });

  it('the chip-scale package: a square block 1.2 mm wide and 0.3 mm high on a diffuse base', () => {
    const s = packageSection(csp);
    const fill = s.regions.find((r) => r.role === 'encapsulant')!;
    expect(numbers(fill.d)).toEqual([-0.6, 0, 0.6, 0, 0.6, -0.3, -0.6, -0.3]);
    expect(s.strokes.find((x) => x.surface === 'base')!.style).toBe('diffuse');
  });

  it('an empty cup fills nothing with the outside medium', () => {
    const p = toTracePackage({ ...packagePresets()[1].scenario, encapsulant: { ...packagePresets()[1].scenario.encapsulant, shape: 'none' } });
    expect(packageSection(packageScene(p)).regions.every((r) => r.role === 'chip')).toBe(true);
  });
});

describe('sectionRays(paths)', () => {
  it('projects each path on x–z and classes it by the kind of its ledger bin', () => {
    const rays = sectionRays([
      { points: [[0, 0.3, 0.1], [1, 0.2, 2]], fate: 'escaped:dome' },
      { points: [[0, 0, 0.1], [0.4, 0, 0]], fate: 'surface:base' },
      { points: [[0, 0, 0.1]], fate: 'medium:chip' }
    ]);
    expect(rays).toEqual([
      { d: 'M0 -0.1 L1 -2', fate: 'escaped', title: 'escaped:dome' },
      { d: 'M0 -0.1 L0.4 0', fate: 'surface', title: 'surface:base' }
    ]);
  });
});

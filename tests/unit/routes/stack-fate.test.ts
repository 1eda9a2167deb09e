// Tests of the /stack page's trapped-light sentences (src/routes/stack/stack-fate.ts).
import { describe, expect, it } from 'vitest';
import { trappedBands } from '../../../src/lib/optics';
import { describeFate, inSentence } from '../../../src/routes/stack/stack-fate';
import type { ExpandedLayer } from '../../../src/routes/stack/stack-layers';

const layer = (n: number, label: string, item: number, sub = 0, subCount = 1): ExpandedLayer => ({ n, k: 0, thicknessNm: 100, label, item, sub, subCount });
const DEG = 180 / Math.PI;

function fate(nChip: number, layers: ExpandedLayer[], nExit: number, exitLabel = 'Air', mode: 'thin' | 'thick' = 'thick') {
  return describeFate({
    bands: trappedBands(nChip, layers, nExit),
    layers,
    chip: { label: 'GaN', n: nChip },
    exit: { label: exitLabel, n: nExit },
    escapeConeDeg: nExit < nChip ? Math.asin(nExit / nChip) * DEG : 90,
    mode
  });
}

describe('describeFate(input)', () => {
  it('says where each band of angles goes for SiO2 on a 2.45 chip into air', () => {
    // Critical angles: asin(1/2.45) = 24.09° (computed; escape cone ½∫T sin θ dθ: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5); asin(1.46/2.45) = 36.57° (computed).
    const text = fate(2.45, [layer(1.46, 'SiO2 film', 0)], 1);
    expect(text).toEqual([
      'Rays leaving the chip within 24.1° of the normal reach air; the stack changes only how much of them is reflected on the way (Fresnel losses).',
      'Rays leaving the chip between 24.1° and 36.6° pass into the SiO2 film (layer 1) and are totally reflected at its top face, against air (n 1.000).',
      'Beyond 36.6°, rays are totally reflected back into the chip at the first interface, against the SiO2 film (layer 1, n 1.460).',
      'A planar stack cannot widen the 24.1° escape cone into air: n·sin θ is conserved through parallel layers, so the cone is set by the chip (n 2.450) and air (n 1.000) alone.'
    ]);
  });

  it('tells the bands trapped inside one graded section as one', () => {
    const subs = [2.2, 2.0, 1.8, 1.6].map((n, j) => layer(n, `graded ${j + 1}/4`, 0, j, 4));
    const text = fate(2.45, subs, 1.41, 'Methyl silicone (n ≈ 1.41)');
    const graded = text.filter((t) => t.includes('graded section (item 1'));
    expect(graded).toHaveLength(2); // one band trapped inside it, one turned back at the chip against its first sublayer
    expect(graded[0]).toMatch(/^Rays leaving the chip between 35\.1° and 63\.9° pass into the graded section \(item 1\)/);
    expect(graded[1]).toBe('Beyond 63.9°, rays are totally reflected back into the chip at the first interface, against a sublayer of the graded section (item 1, n 2.200).');
    expect(text.join(' ')).toContain('escape cone into methyl silicone');
  });

  it('has no escape-cone sentence when the exit is not less dense than the chip', () => {
    const text = fate(1.5, [], 1.6, 'Glass');
    expect(text).toEqual(['Rays leaving the chip up to 90.0° reach glass, which is not less dense than the chip (n 1.600 against 1.500).']);
  });

  it('adds the tunnelling caveat in thin-film mode when a layer blocks rays inside the cone', () => {
    // Layer 1.2 blocks from asin(1.2/2.45) = 29.3°, inside the cone into 1.41 (35.1°).
    const thin = fate(2.45, [layer(1.2, 'n 1.2', 0)], 1.41, 'Silicone', 'thin');
    expect(thin.at(-1)).toMatch(/tunnel through it \(frustrated total internal reflection\)/);
    expect(fate(2.45, [layer(1.2, 'n 1.2', 0)], 1.41, 'Silicone', 'thick').join(' ')).not.toMatch(/tunnel/);
  });
});

describe('inSentence(name)', () => {
  it('lower-cases plain words and keeps formulas and acronyms', () => {
    expect(inSentence('Air')).toBe('air');
    expect(inSentence('Methyl silicone (n ≈ 1.41)')).toBe('methyl silicone');
    expect(inSentence('SiO2 film')).toBe('SiO2 film');
    expect(inSentence('PMMA (acrylic)')).toBe('PMMA (acrylic)');
  });
});

/**
 * Where the light beyond the escape cone goes, in words: built from the optics core's trapped bands
 * (n·sin θ invariance) with the page's own names for the layers. Pure.
 */
import type { TrappedBand } from '$lib/optics';
import type { ExpandedLayer } from './stack-layers';

export interface FateMedium {
  label: string;
  n: number;
}

export interface FateInput {
  bands: readonly TrappedBand[];
  layers: readonly ExpandedLayer[];
  chip: FateMedium;
  exit: FateMedium;
  /** Half-angle of the escape cone into the exit medium, degrees (90 when the exit is not less dense). */
  escapeConeDeg: number;
  mode: 'thin' | 'thick';
}

const deg = (x: number) => `${x.toFixed(1)}°`;
const idx = (n: number) => n.toFixed(3);

/** A material's name without a trailing "(n ≈ 1.41)", for places that print the computed index beside it. */
export function plainName(name: string): string {
  return name.replace(/\s*\(n ≈[^)]*\)\s*$/, '');
}

/** A name fit for the middle of a sentence: "Methyl silicone (n ≈ 1.41)" → "methyl silicone"; "SiO2 film" stays. */
export function inSentence(name: string): string {
  const bare = plainName(name);
  return /^[A-Z][a-z]+(\s|$)/.test(bare) ? bare.charAt(0).toLowerCase() + bare.slice(1) : bare;
}

/** "the SiO2 film (layer 1)", "layer 2 (n 1.8)", "the graded section (item 3)"; `extra` goes inside the brackets. */
function itemName(layers: readonly ExpandedLayer[], i: number, extra = ''): string {
  const l = layers[i];
  if (l.subCount > 1) return `the graded section (item ${l.item + 1}${extra})`;
  if (l.label.startsWith('n ')) return `layer ${l.item + 1} (${l.label}${extra})`;
  return `the ${inSentence(l.label)} (layer ${l.item + 1}${extra})`;
}

function blockerName(input: FateInput, b: TrappedBand): string {
  if (b.blockedBy === 'outside') return `${inSentence(input.exit.label)} (n ${idx(input.exit.n)})`;
  const l = input.layers[b.blockedBy as number];
  if (l.subCount > 1) return `a sublayer of the graded section (item ${l.item + 1}, n ${idx(l.n)})`;
  return l.label.startsWith('n ') ? itemName(input.layers, b.blockedBy as number) : itemName(input.layers, b.blockedBy as number, `, n ${idx(l.n)}`);
}

/** Which item a band's light is trapped in: 'chip', or the stack item (graded sublayers count as their section). */
function place(input: FateInput, b: TrappedBand): string {
  if (b.fate === 'escapes') return 'out';
  if (b.trappedIn === 'chip') return 'chip';
  return `item ${input.layers[b.trappedIn as number].item}`;
}

/**
 * Plain sentences, one per group of angles, then the rule that a planar stack cannot widen the cone:
 * "Rays leaving the chip between 24.1° and 35.2° pass into the SiO2 film (layer 1) and are totally
 * reflected at its top face, against air (n 1.000)." Bands trapped inside one graded section are
 * told as one.
 */
export function describeFate(input: FateInput): string[] {
  const out: string[] = [];
  const exit = inSentence(input.exit.label);
  const cone = input.escapeConeDeg;
  const open = cone < 90 - 1e-9;

  // Merge consecutive bands that end in the same place (sublayers of one graded section)
  const groups: { first: TrappedBand; last: TrappedBand }[] = [];
  for (const b of input.bands) {
    const g = groups[groups.length - 1];
    if (g && place(input, g.last) === place(input, b)) g.last = b;
    else groups.push({ first: b, last: b });
  }

  for (const { first, last } of groups) {
    const from = first.fromDeg;
    const to = last.toDeg;
    if (first.fate === 'escapes') {
      out.push(
        open
          ? `Rays leaving the chip within ${deg(to)} of the normal reach ${exit}; the stack changes only how much of them is reflected on the way (Fresnel losses).`
          : `Rays leaving the chip up to ${deg(to)} reach ${exit}, which is not less dense than the chip (n ${idx(input.exit.n)} against ${idx(input.chip.n)}).`
      );
    } else if (first.trappedIn === 'chip') {
      out.push(
        `Beyond ${deg(from)}, rays are totally reflected back into the chip at the first interface, against ${blockerName(input, first)}.`
      );
    } else {
      const l = input.layers[first.trappedIn as number];
      const where = l.subCount > 1 ? 'are totally reflected inside it, where its index falls below the ray’s n·sin θ' : `are totally reflected at its top face, against ${blockerName(input, first)}`;
      out.push(`Rays leaving the chip between ${deg(from)} and ${deg(to)} pass into ${itemName(input.layers, first.trappedIn as number)} and ${where}.`);
    }
  }

  if (open) {
    out.push(
      `A planar stack cannot widen the ${deg(cone)} escape cone into ${exit}: n·sin θ is conserved through parallel layers, so the cone is set by the chip (n ${idx(input.chip.n)}) and ${exit} (n ${idx(input.exit.n)}) alone.`
    );
  }
  const blockedInsideCone = input.bands.some((b) => b.fate === 'trapped' && b.blockedBy !== 'outside' && b.fromDeg < cone - 1e-9);
  if (input.mode === 'thin' && blockedInsideCone) {
    out.push(
      `In thin-film mode a low-index layer much thinner than the wavelength still lets some light inside the ${deg(cone)} cone tunnel through it (frustrated total internal reflection); beyond the cone nothing reaches ${exit} either way.`
    );
  }
  return out;
}

import type { TraceEncapsulant, TracePackage } from '../trace/package-spec';

/**
 * A copy of `pkg` with some encapsulant fields replaced; the input is never changed, so one scenario
 * package can seed every point of a sweep.
 */
export function withEncapsulant(pkg: TracePackage, patch: Partial<TraceEncapsulant>): TracePackage {
  return {
    chip: { ...pkg.chip },
    base: { ...pkg.base },
    encapsulant: { ...pkg.encapsulant, ...patch },
    outsideN: pkg.outsideN,
    polarization: pkg.polarization
  };
}

/** A copy of `pkg` with no encapsulant: the bare chip on the same base, in the outside medium. */
export function bareChip(pkg: TracePackage): TracePackage {
  return withEncapsulant(pkg, { shape: 'none' });
}

import type { TraceEncapsulant, TracePackage } from '../trace/package-spec';

/**
 * A copy of `pkg` with some encapsulant fields replaced (body and base finish kept); the input is never
 * changed, so one scenario package can seed every point of a sweep.
 */
export function withEncapsulant(pkg: TracePackage, patch: Partial<TraceEncapsulant>): TracePackage {
  return {
    chip: { ...pkg.chip },
    base: { ...pkg.base },
    encapsulant: { ...pkg.encapsulant, ...patch },
    outsideN: pkg.outsideN,
    polarization: pkg.polarization,
    ...(pkg.baseFinish ? { baseFinish: pkg.baseFinish } : {}),
    ...(pkg.body ? { body: { ...pkg.body } } : {})
  };
}

/**
 * A copy of `pkg` with no encapsulant: the bare chip on the same base (finish kept), in the outside
 * medium — on the flat body, so a cup's wall is not part of the reference.
 */
export function bareChip(pkg: TracePackage): TracePackage {
  const { body: _cup, ...bare } = withEncapsulant(pkg, { shape: 'none' });
  return bare;
}

import { validateTracePackage, type TracePackage } from '../trace/package-spec';

/** True when the tracer accepts the package, i.e. (for a valid scenario's variant) the chip still fits. */
export function packageFits(pkg: TracePackage): boolean {
  try {
    validateTracePackage(pkg);
    return true;
  } catch {
    return false;
  }
}

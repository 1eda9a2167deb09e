import { describe, expect, it } from 'vitest';
import { roundSignificant } from '../../../src/lib/export/number-text';
import { demoScenario, toTracePackage } from '../../../src/lib/scenario/index';
import { domeClosedForm } from '../../../src/lib/sweeps/dome-closed-form';
import { planIndexSweep } from '../../../src/lib/sweeps/plan-index-sweep';
import { summarize } from '../../../src/lib/trace/summary';
import { createTally } from '../../../src/lib/trace/tally';
import { domeExport } from '../../../src/routes/dome/dome-export';

describe('domeExport(...) (dome page)', () => {
  const scenario = demoScenario();
  const pkg = toTracePackage(scenario);
  const closed = domeClosedForm(pkg);
  const indices = { nChip: pkg.chip.n, nEnc: pkg.encapsulant.n, nOut: 1 };

  it('writes the closed form and the whole scenario, and null for a trace not yet run', () => {
    const doc = JSON.parse(domeExport(scenario, 450, indices, closed, null, []));
    expect(doc).toMatchObject({ app: 'Outcouple', view: 'dome', formatVersion: 1, wavelengthNm: 450, trace: null, sweeps: [] });
    // Exports write 12 significant digits (no float noise): roundSignificant gives the same number
    expect(doc.closedForm.etaDome).toBe(roundSignificant(closed.etaDome));
    expect(doc.scenario).toEqual(scenario);
  });

  it('writes non-finite numbers as null, never NaN (which JSON cannot hold)', () => {
    const empty = summarize(createTally()); // nothing launched: no far-field angles
    const text = domeExport(scenario, 450, indices, closed, {
      scenario, dome: empty, bare: null, gain: null, seconds: 0, raysPerSecond: Number.NaN, workers: 2, stale: false
    }, []);
    expect(text).not.toMatch(/NaN|Infinity/);
    expect(JSON.parse(text).trace.raysPerSecond).toBeNull();
  });

  it('lists every planned sweep point, with the trace values where they exist', () => {
    const plan = planIndexSweep(pkg, [1.4, 1.5]);
    const doc = JSON.parse(domeExport(scenario, 450, indices, closed, null, [
      { plan, results: [{ x: 1.5, closedForm: plan.points[1].closedForm, extraction: 0.4, stderr: 0.002 }], raysPerPoint: 50_000 }
    ]));
    expect(doc.sweeps[0].points).toEqual([
      { x: 1.4, closedForm: roundSignificant(plan.points[0].closedForm), extraction: null, stderr: null },
      { x: 1.5, closedForm: roundSignificant(plan.points[1].closedForm), extraction: 0.4, stderr: 0.002 }
    ]);
  });
});

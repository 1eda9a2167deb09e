import { writeFileSync } from 'node:fs';
import { summarize } from '../../lib/trace/summary';
import { packageScene } from '../../lib/trace/package-scene';
import { partShares } from '../../lib/trace/part-shares';
import { traceSync } from '../../lib/trace/trace';
import { defaultThreads, traceParallel, MAX_THREADS } from '../../lib/trace/node/node-pool';
import { LIMITS, toWhitePackage } from '../../lib/scenario';
import { farFieldCsv, lumensPerChipWatt, luminousBinIntensities, packageOpening, traceIes, whiteFluxNote } from '../../lib/export';
import { CliError } from '../cli-error';
import { integerOption, numberOption, parseOptions, stringOption, truncate, type OptionSpec } from '../options';
import { emit, percent, type Row } from '../output';
import { SCENARIO_OPTION_HELP, SCENARIO_OPTIONS, scenarioFromOptions } from '../scenario-options';
import { checkPhosphorFit, PHOSPHOR_OPTION_HELP, PHOSPHOR_OPTIONS, phosphorFromOptions } from '../phosphor-options';
import { phosphorSummary, type PhosphorSummary } from '../../lib/trace/phosphor-summary';

export const summary = 'Monte Carlo ray trace of an LED package: extraction, loss ledger, far field; IES LM-63 export';
export const help = `outcouple trace — Monte Carlo ray trace of a package (units mm, z up, base plane z = 0)

With no options it traces the app's demo scenario, with the same rays and seed as the page.

${SCENARIO_OPTION_HELP}
${PHOSPHOR_OPTION_HELP}
Run
  --threads T                         1 to ${MAX_THREADS} (default: all cores; any count gives the same ledger)
  --max-events E                      events before a ray counts as lost, ${LIMITS.maxEvents.min} to ${LIMITS.maxEvents.max} (default 1000; 10000 with a phosphor)
Output
  --ies FILE --lumens L               write the far field as an IES LM-63-2019 file scaled to L lm; with a
                                      phosphor --lumens may be left out: the file then carries the traced
                                      luminous flux per 1 W of chip light (683 lm/W x integral V(lambda) Phi(lambda))
  --csv FILE                          write the far field as CSV (with --lumens: candela too)
  --json                              print one JSON object

Example: outcouple trace --chip 1x1x0.15 --enc-material silicone-phenyl --rays 1000000 --json`;

const options: OptionSpec = {
  ...SCENARIO_OPTIONS,
  ...PHOSPHOR_OPTIONS,
  threads: { type: 'string' }, 'max-events': { type: 'string' }, ies: { type: 'string' }, lumens: { type: 'string' },
  csv: { type: 'string' }, json: { type: 'boolean' }
};

function writeOutput(path: string, text: string, option: string): void {
  try {
    writeFileSync(path, text);
  } catch {
    throw new CliError(`--${option}: cannot write '${truncate(path, 80)}'`);
  }
}

export async function run(argv: string[]): Promise<void> {
  const { values, positionals } = parseOptions(argv, options, 'trace');
  if (positionals.length) throw new CliError(`trace: unexpected argument '${truncate(positionals[0])}'`);
  const { scenario, resolved } = scenarioFromOptions(values);
  // Phosphor options win over the scenario's phosphor block
  const setting = phosphorFromOptions(values) ?? undefined;
  const pkg = toWhitePackage(scenario, resolved, setting);
  checkPhosphorFit(pkg);
  const { rays, seed } = scenario.trace;
  const name = scenario.name;
  const threads = integerOption(values, 'threads', 1, MAX_THREADS, defaultThreads());
  const maxEvents = integerOption(values, 'max-events', LIMITS.maxEvents.min, LIMITS.maxEvents.max, pkg.phosphor ? 10000 : 1000);
  const iesPath = stringOption(values, 'ies');
  const csvPath = stringOption(values, 'csv');
  const lumensGiven = values.lumens !== undefined;
  if (iesPath && !lumensGiven && !setting) throw new CliError('--ies needs --lumens (the flux to scale the file to, 1e-6 to 1e7 lm)');
  let lumens = numberOption(values, 'lumens', 1e-6, 1e7, 100);

  const started = performance.now();
  // the scenario schema has checked the package: the tracer's own edge check cannot refuse it
  const tally = threads === 1 ? traceSync(pkg, { rays, seed, maxEvents }) : await traceParallel(pkg, { rays, seed, maxEvents }, threads);
  const seconds = (performance.now() - started) / 1000;
  const s = summarize(tally);
  const notes: string[] = [];
  if (s.trappedNote) notes.push(s.trappedNote);
  if (s.geometryNote) notes.push(s.geometryNote);

  const white = phosphorSummary(tally);
  if (iesPath || csvPath) {
    if (s.counts.escaped === 0) throw new CliError('no ray escaped, so there is no far field to write');
    // A white package: a luminous far field, and its flux from the traced spectrum (white-ies.ts)
    const lmPerChipWatt = white ? lumensPerChipWatt(white) : null;
    if (white && lmPerChipWatt === null) throw new CliError('no visible light escaped, so there is no luminous flux to write');
    if (lmPerChipWatt !== null && !lumensGiven) lumens = lmPerChipWatt;
    const bins = s.farField.bins.map((b) => b.relativeIntensity);
    // The same file the dome page writes: zone-averaged near the poles, the smoothing stated in it
    const ies = traceIes({ binIntensities: white ? luminousBinIntensities(bins, white.luminousBandWeights) : bins, lumens, rays, seed,
      issueDate: new Date().toISOString().slice(0, 10), name, opening: packageOpening(pkg.encapsulant, pkg.chip, pkg.body),
      ...(lmPerChipWatt !== null ? { fluxNote: whiteFluxNote(lmPerChipWatt, lumens, lumensGiven) } : {}) });
    if (iesPath) {
      writeOutput(iesPath, ies.text, 'ies');
      notes.push(`IES LM-63 file written to ${iesPath} (${Number(lumens.toPrecision(6))} lm${white && !lumensGiven ? ' per 1 W of chip light, from the traced spectrum' : ''})`);
    }
    if (csvPath) {
      writeOutput(csvPath, farFieldCsv(ies.farField, lumens), 'csv');
      notes.push(`far-field CSV written to ${csvPath}`);
    }
  }

  if (white) notes.push(...whiteNotes(white));
  const scene = packageScene(pkg);
  const shares = partShares(s, scene);
  const result = {
    scenario, package: pkg, scene, rays, seed, threads,
    extraction: s.extraction, stderr: s.stderr, ledger: { ...s.ledger, ...shares }, counts: s.counts,
    escapedBelowHorizon: s.escapedBelowHorizon, perSurface: s.perSurface, escapedBySurface: s.escapedBySurface, parts: s.parts,
    eventsPerRay: s.eventsPerRay,
    geometryErrors: s.geometryErrors, raysPerSecond: rays / seconds, seconds,
    farField: { beamAngleDeg: s.farField.beamAngleDeg, beamAngleNote: s.farField.beamAngleNote, onAxisVsLambertian: s.farField.onAxisVsLambertian, bins: s.farField.bins },
    ...(white ? whiteJson(white, s.ledger) : {}),
    notes
  };
  const rows: Row[] = [
    ['extraction', `${percent(s.extraction, 2)} ± ${percent(s.stderr, 2)}`, '(1 standard error)'],
    ['escaped', percent(s.ledger.escaped, 2)], ['  of which below the horizon', percent(s.escapedBelowHorizon, 2)],
    ['absorbed in the chip', percent(s.ledger.chip, 2)],
    ...(shares.chipLayers.length > 1 ? shares.chipLayers.map((l): Row => [`  in layer ${l.name}`, percent(l.fraction, 2)]) : []),
    ['absorbed in the encapsulant', percent(s.ledger.encapsulant, 2)],
    ['absorbed at the base, wall and mirrors', percent(s.ledger.base, 2)],
    ...(pkg.body?.kind === 'cup' ? [['  at the cup wall', percent(shares.wall, 2)] as Row] : []),
    ...(pkg.chip.mirror ? [['  at the chip mirror', percent(shares.mirror, 2)] as Row] : []),
    ['lost (event cap)', percent(s.ledger.lost, 2)],
    ...Object.entries(s.escapedBySurface).map(([surface, f]): Row => [`escaped via ${surface}`, percent(f, 2)]),
    ['beam angle (full width at half maximum)', s.farField.beamAngleDeg === null ? `— ${s.farField.beamAngleNote ?? ''}` : s.farField.beamAngleDeg.toFixed(1), s.farField.beamAngleDeg === null ? '' : '°'],
    ['on-axis intensity vs Lambertian', s.farField.onAxisVsLambertian === null ? '—' : s.farField.onAxisVsLambertian.toFixed(3), '×'],
    ['events per ray', s.eventsPerRay.toFixed(2)], ['rays', rays], ['threads', threads],
    ['speed', (rays / seconds / 1e6).toFixed(2), 'million rays/s']
  ];
  if (white) rows.push(...whiteRows(white));
  emit(values.json === true, result, 'Package ray trace', rows, notes);
}

/** The white-light part of the JSON: ledger.phosphor, photon fractions, energy efficiency, colour, spectrum, colour over angle. */
function whiteJson(w: PhosphorSummary, ledger: Record<string, number>) {
  const c = w.color;
  return {
    ledger: { ...ledger, phosphor: w.phosphorHeat },
    escapedBlue: w.escapedBlue,
    escapedConverted: w.escapedConverted,
    energyEfficiency: w.energyEfficiency,
    lumensPerWattOfChipLight: lumensPerChipWatt(w),
    stokes: { meanChipNm: w.meanChipNm, meanEscapedNm: w.meanEscapedNm },
    color: c && {
      x: c.x, y: c.y, uPrime: c.uPrime, vPrime: c.vPrime, cctK: c.cctK, duv: c.duv, ra: c.ra, r9: c.r9, lerLmPerW: c.lerLmPerW,
      sigma: c.sigma, warnings: c.warnings
    },
    spectrum: w.spectrum,
    colorOverAngle: { bins: w.colorOverAngle, deltaUvPrime: w.deltaUvPrime },
    scatterEventsPerRay: w.scatterEventsPerRay,
    conversionsPerRay: w.conversionsPerRay
  };
}

function whiteNotes(w: PhosphorSummary): string[] {
  const notes = ['each ray sees the library indices at its own wavelength (typed indices, metal mirrors and the Mie host index stay at the design wavelength)'];
  if (w.color) notes.push(...w.color.warnings);
  notes.push('caution: a white LED still emits intense blue; do not stare into it, and mind the phosphor heat in a real package');
  return notes;
}

function whiteRows(w: PhosphorSummary): Row[] {
  const c = w.color;
  const f = (v: number | null, d: number, sigma?: number | null) => (v === null ? '—' : sigma ? `${v.toFixed(d)} ± ${sigma.toFixed(d)}` : v.toFixed(d));
  return [
    ['absorbed by the phosphor (heat)', percent(w.phosphorHeat, 2)],
    ['escaped blue (not converted)', percent(w.escapedBlue, 2)], ['escaped converted', percent(w.escapedConverted, 2)],
    ['energy efficiency (W out / W of chip light)', percent(w.energyEfficiency, 2)],
    ['chromaticity x, y', c ? `${f(c.x, 4, c.sigma.x)}, ${f(c.y, 4, c.sigma.y)}` : '—'],
    ['CCT', c ? f(c.cctK, 0, c.sigma.cctK) : '—', 'K'], ['Duv', c ? f(c.duv, 4, c.sigma.duv) : '—'],
    ['Ra, R9', c ? `${f(c.ra, 1)}, ${f(c.r9, 1)}` : '—'], ['luminous efficacy of radiation', c ? c.lerLmPerW.toFixed(0) : '—', 'lm/W'],
    ['Δu′v′ over angle', f(w.deltaUvPrime, 4)], ['scatter events per ray', w.scatterEventsPerRay.toFixed(2)]
  ];
}

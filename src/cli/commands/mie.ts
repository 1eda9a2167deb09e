import { mieEfficiencies, particleCloud, PARTICLE_CLOUD_LIMITS as L } from '../../lib/scatter';
import { CliError } from '../cli-error';
import { numberOption, parseOptions, type OptionSpec } from '../options';
import { emit, type Row } from '../output';

export const summary = 'Mie efficiencies of one sphere and, with a load, the scattering and absorption coefficients';
export const help = `outcouple mie — light scattering by spherical particles in a host (Bohren & Huffman's algorithm)

  --diameter UM           particle diameter (${L.diameterUm.min} to ${L.diameterUm.max} µm)
  --n-particle N          particle refractive index, real part (${L.particleN.min} to ${L.particleN.max})
  --k-particle K          particle extinction coefficient k ≥ 0 (${L.particleK.min} to ${L.particleK.max}, default 0)
  --n-host N              host refractive index (${L.hostN.min} to ${L.hostN.max}, default 1)
  --wavelength NM         vacuum wavelength (${L.wavelengthNm.min} to ${L.wavelengthNm.max} nm)
  --wt PERCENT            particle weight fraction of the mixture (0 to ${L.weightFraction.max * 100} %); needs both densities
  --density-particle G    particle density (${L.densityGPerCm3.min} to ${L.densityGPerCm3.max} g/cm³)
  --density-host G        host density (${L.densityGPerCm3.min} to ${L.densityGPerCm3.max} g/cm³)
  --json                  print one JSON object: qExt, qSca, qAbs, qBack, g (and musPerMm, muaPerMm with a load)

Independent scattering: valid for dilute mixtures (volume fraction up to about 10 %).

Example: outcouple mie --diameter 10 --n-particle 1.83 --k-particle 0.0005 --n-host 1.41 --wavelength 450 --wt 8 --density-particle 4.55 --density-host 1.1 --json`;

const options: OptionSpec = {
  diameter: { type: 'string' }, 'n-particle': { type: 'string' }, 'k-particle': { type: 'string' }, 'n-host': { type: 'string' },
  wavelength: { type: 'string' }, wt: { type: 'string' }, 'density-particle': { type: 'string' }, 'density-host': { type: 'string' },
  json: { type: 'boolean' }
};

export function run(argv: string[]): void {
  const { values, positionals } = parseOptions(argv, options, 'mie');
  if (positionals.length) throw new CliError(`mie: unexpected argument '${positionals[0].slice(0, 40)}'`);
  const diameterUm = numberOption(values, 'diameter', L.diameterUm.min, L.diameterUm.max);
  const particleN = numberOption(values, 'n-particle', L.particleN.min, L.particleN.max);
  const particleK = numberOption(values, 'k-particle', L.particleK.min, L.particleK.max, 0);
  const hostN = numberOption(values, 'n-host', L.hostN.min, L.hostN.max, 1);
  const wavelengthNm = numberOption(values, 'wavelength', L.wavelengthNm.min, L.wavelengthNm.max);
  const loaded = values.wt !== undefined;
  if (!loaded && (values['density-particle'] !== undefined || values['density-host'] !== undefined)) {
    throw new CliError('--density-particle and --density-host need --wt (the weight fraction, 0 to 95 %)');
  }

  // Relative index and size parameter in the host: m = (n + ik)/n_host, x = π·d·n_host/λ0
  const x = (Math.PI * diameterUm * hostN) / (wavelengthNm * 1e-3);
  const q = mieEfficiencies(particleN / hostN, particleK / hostN, x);
  const result: Record<string, unknown> = {
    diameterUm, wavelengthNm, particleN, particleK, hostN,
    relativeIndex: { re: particleN / hostN, im: particleK / hostN }, sizeParameter: x,
    qExt: q.qExt, qSca: q.qSca, qAbs: q.qAbs, qBack: q.qBack, g: q.g
  };
  const rows: Row[] = [
    ['size parameter x = πd·n_host/λ', x], ['relative index m', `${(particleN / hostN).toFixed(5)} + ${(particleK / hostN).toPrecision(4)}i`],
    ['Qext', q.qExt], ['Qsca', q.qSca], ['Qabs', q.qAbs], ['Qback', q.qBack], ['g (mean cosine)', q.g]
  ];
  if (loaded) {
    const wtPercent = numberOption(values, 'wt', 0, L.weightFraction.max * 100);
    const particleDensity = numberOption(values, 'density-particle', L.densityGPerCm3.min, L.densityGPerCm3.max);
    const hostDensity = numberOption(values, 'density-host', L.densityGPerCm3.min, L.densityGPerCm3.max);
    const cloud = particleCloud({
      wavelengthNm, particleN, particleK, hostN, size: { kind: 'single', diameterUm },
      weightFraction: wtPercent / 100, particleDensityGPerCm3: particleDensity, hostDensityGPerCm3: hostDensity
    });
    Object.assign(result, {
      weightPercent: wtPercent, densityParticle: particleDensity, densityHost: hostDensity,
      volumeFraction: cloud.volumeFraction, numberPerMm3: cloud.numberPerMm3, musPerMm: cloud.musPerMm, muaPerMm: cloud.muaPerMm
    });
    rows.push(['volume fraction', cloud.volumeFraction], ['particles per mm³', cloud.numberPerMm3],
      ['μs (scattering)', cloud.musPerMm, '1/mm'], ['μa (absorption)', cloud.muaPerMm, '1/mm']);
  }
  const notes = loaded && (result.volumeFraction as number) > 0.1
    ? ['volume fraction above 10 %: particles are close enough that independent scattering overestimates μs']
    : [];
  result.warnings = notes;
  emit(values.json === true, result, 'Mie scattering', rows, notes);
}

/** The app's pages, in the order the navigation shows them. */
export interface NavPage {
  path: string;
  label: string;
  /** One line on what the page answers (home page list). */
  blurb: string;
}

export const NAV_PAGES: readonly NavPage[] = [
  { path: '/', label: 'Home', blurb: 'What Outcouple is for and the demo scenario.' },
  {
    path: '/escape',
    label: 'Escape cone',
    blurb: 'Critical angle and how much light leaves one flat chip face, with and without Fresnel losses.'
  },
  {
    path: '/stack',
    label: 'Layer stack',
    blurb: 'Thin films and thick layers on the chip: what they change inside the escape cone, and what they cannot.'
  },
  {
    path: '/dome',
    label: 'Dome',
    blurb: 'Gain from a dome encapsulant, the dome size that traps no light, and the package ray trace.'
  },
  {
    path: '/white',
    label: 'White light',
    blurb: 'A phosphor in the encapsulant: colour, CCT, colour rendering, efficiency, and the load for a target CCT.'
  },
  {
    path: '/beam',
    label: 'Beam optics',
    blurb: 'A reflector, a lens or a TIR collimator over the package: efficiency, beam angle, cd/klm and the étendue limit.'
  },
  { path: '/materials', label: 'Materials', blurb: 'The refractive index library, with sources and valid ranges.' },
  {
    path: '/variants',
    label: 'Variants',
    blurb: 'Kept variants of the scenario side by side: traced extraction, ratio to the first, ledgers and far fields.'
  },
  { path: '/compare', label: 'Compare', blurb: 'Every encapsulant in the library ranked for this chip and dome.' },
  {
    path: '/claim',
    label: 'Claim check',
    blurb: 'Test an extraction or efficiency claim against what the optics allow.'
  },
  { path: '/report', label: 'Report', blurb: 'A printable summary of the scenario and its results.' }
];

/** Whether `current` (a pathname) is the page at `path` (trailing slashes ignored). */
export function isCurrent(path: string, current: string): boolean {
  const strip = (p: string) => (p.length > 1 ? p.replace(/\/+$/, '') : p);
  return strip(path) === strip(current);
}

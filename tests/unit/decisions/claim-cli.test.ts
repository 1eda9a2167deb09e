import { describe, it, expect, vi, afterEach } from 'vitest';
import { run, help, summary } from '../../../src/cli/commands/claim';
import { CliError } from '../../../src/cli/cli-error';

function capture(argv: string[]): string {
  let out = '';
  const spy = vi.spyOn(process.stdout, 'write').mockImplementation((chunk: string | Uint8Array) => {
    out += String(chunk);
    return true;
  });
  try {
    run(argv);
  } finally {
    spy.mockRestore();
  }
  return out;
}

afterEach(() => vi.restoreAllMocks());

describe('outcouple claim', () => {
  it('has a one-line summary and a help text with an example', () => {
    expect(summary).not.toMatch(/\n/);
    expect(help).toMatch(/Example: outcouple claim --kind extraction --value 85 /);
    expect(help).toMatch(/in percent for extraction and coating/);
  });

  it('--json: 85 % extraction for planar GaN in silicone is impossible, with reason and bounds', () => {
    const data = JSON.parse(capture(['--kind', 'extraction', '--value', '85', '--n-chip', '2.45', '--n-enc', '1.41', '--structure', 'planar', '--json']));
    expect(data.verdict).toBe('impossible');
    expect(data.reason).toMatch(/85 %/);
    const ids = data.bounds.map((b: { id: string }) => b.id);
    expect(ids).toEqual(expect.arrayContaining(['claim', 'ideal-dome', 'recycling-limit']));
    expect(data.nEnc).toBe(1.41);
    expect(data.faces).toBe(5); // the page's default: top and four sides
    expect(data.value).toBe(0.85);
  });

  it('reads materials by name at the wavelength and prints a readable table', () => {
    const text = capture(['--kind', 'gain', '--value', '2.5', '--chip-material', 'GaN', '--enc-material', 'epoxy', '--structure', 'planar']);
    expect(text).toMatch(/^Claim check: gain/);
    expect(text).toMatch(/verdict\s+CONSISTENT/);
    expect(text).toMatch(/note: A 2\.5× gain is within/);
  });

  it('a flat coating of +40 % on bare GaN is impossible', () => {
    const data = JSON.parse(capture(['--kind', 'coating', '--value', '40', '--n-chip', '2.45', '--shape', 'none', '--structure', 'planar', '--json']));
    expect(data.verdict).toBe('impossible');
    expect(data.nEnc).toBeNull();
  });

  it('takes the page\'s defaults: the demo scenario\'s chip, encapsulant and outside, a planar chip, five faces', () => {
    const data = JSON.parse(capture(['--value', '30', '--json']));
    expect(data).toMatchObject({ kind: 'extraction', structure: 'planar', faces: 5, wavelengthNm: 450 });
    expect(data.nChip).toBeCloseTo(2.4869, 3); // GaN at 450 nm, Barker & Ilegems 1973 (the library's source)
  });

  it('a negative coating "increase" parses and is judged as a decrease', () => {
    const data = JSON.parse(capture(['--kind', 'coating', '--value', '-5', '--json']));
    expect(data.value).toBe(-0.05);
    expect(data.verdict).toBe('consistent');
    expect(data.reason).toMatch(/^This is a decrease of 5 %/);
  });

  it('refuses bad input with the option and its range named', () => {
    expect(() => capture(['--kind', 'lumens', '--value', '50'])).toThrow(/--kind must be one of extraction, gain, coating/);
    expect(() => capture(['--kind', 'extraction'])).toThrow(/--value is required \(in percent, e.g. 85\)/);
    expect(() => capture(['--kind', 'extraction', '--value', '185'])).toThrow(/^--value: Claimed extraction must be more than 0 and at most 100 %\.$/);
    expect(() => capture(['--kind', 'extraction', '--value', '0'])).toThrow(/^--value: Claimed extraction must be more than 0/);
    expect(() => capture(['--kind', 'gain', '--value', '2', '--shape', 'none'])).toThrow(/a gain claim needs an encapsulant/);
    expect(() => capture(['--kind', 'gain', '--value', '2', '--faces', '4'])).toThrow(/--faces must be one of 1, 5, 6/);
    expect(() => capture(['--value', '50', '--n-chip', '9'])).toThrow(/^--n-chip: Chip index n must be between 1 and 6\.$/);
    expect(() => capture(['--value', '50', '--n-chip', '9'])).toThrow(CliError);
  });
});

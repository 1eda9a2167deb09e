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
    expect(help).toMatch(/Example: outcouple claim --kind extraction --value 0.85/);
  });

  it('--json: 85 % extraction for planar GaN in silicone is impossible, with reason and bounds', () => {
    const data = JSON.parse(capture(['--kind', 'extraction', '--value', '0.85', '--n-chip', '2.45', '--n-enc', '1.41', '--structure', 'planar', '--json']));
    expect(data.verdict).toBe('impossible');
    expect(data.reason).toMatch(/85 %/);
    const ids = data.bounds.map((b: { id: string }) => b.id);
    expect(ids).toEqual(expect.arrayContaining(['claim', 'ideal-dome', 'recycling-limit']));
    expect(data.nEnc).toBe(1.41);
    expect(data.faces).toBe(6);
  });

  it('reads materials by name at the wavelength and prints a readable table', () => {
    const text = capture(['--kind', 'gain', '--value', '2.5', '--chip-material', 'GaN', '--enc-material', 'epoxy', '--structure', 'planar']);
    expect(text).toMatch(/^Claim check: gain/);
    expect(text).toMatch(/verdict\s+CONSISTENT/);
    expect(text).toMatch(/note: A 2\.5× gain is within/);
  });

  it('a flat coating of +40 % on bare GaN is impossible', () => {
    const data = JSON.parse(capture(['--kind', 'coating', '--value', '0.4', '--n-chip', '2.45', '--structure', 'planar', '--json']));
    expect(data.verdict).toBe('impossible');
    expect(data.nEnc).toBeNull();
  });

  it('refuses bad input with the option and its range named', () => {
    expect(() => capture(['--value', '0.5', '--n-chip', '2.45'])).toThrow(/--kind is required/);
    expect(() => capture(['--kind', 'lumens', '--value', '0.5', '--n-chip', '2.45'])).toThrow(/--kind must be one of extraction, gain, coating/);
    expect(() => capture(['--kind', 'extraction', '--value', '85', '--n-chip', '2.45'])).toThrow(/--value must be a number from 0 to 1/);
    expect(() => capture(['--kind', 'gain', '--value', '2', '--n-chip', '2.45'])).toThrow(/--n-enc \(or --enc-material\) is required for a gain claim/);
    expect(() => capture(['--kind', 'gain', '--value', '2', '--n-chip', '2.45', '--n-enc', '1.4', '--faces', '4'])).toThrow(/--faces must be one of 1, 5, 6/);
    expect(() => capture(['--kind', 'extraction', '--value', '0.5', '--n-chip', '9'])).toThrow(CliError);
    expect(() => capture(['--kind', 'extraction', '--value', '0', '--n-chip', '2.45'])).toThrow(/--value must be above 0/);
  });
});

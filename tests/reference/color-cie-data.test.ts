/** The CIE tables in data/cie are the CIE's own files, and the generated JSON the app reads equals them. */
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import tables from '../../data/cie/cie-tables.json';
import { cieFile } from '../support/cie-files';

// published: SHA-256 checksums in the CIE's metadata record of each dataset (https://cie.co.at/data-tables)
const checksums: Record<string, string> = {
  'CIE_xyz_1931_2deg.csv': 'fa663e3535a7e0763a745993a1f0a192eb0275ac46ad2d1befd7626841e713c1',
  'CIE_std_illum_D65.csv': 'e76f210bffff3d552ef7113025da5f325d5dfec200dd4b878b1a2f3a507032cb',
  'CIE_std_illum_A_1nm.csv': '61ef23fe146b8b665c74706717ab28cec7db6c9022993490bdc71991f43cb59b',
  'CIE_illum_Dxx_comp.csv': '4056cf7c1afb23fb8820ff9cbc383a80005acdffe1c0a6945c6032616e08c6be',
  'CIE_illum_FLs.csv': '24303adacbfee5e19b2123ea2c3208a993577a054abaf55ea7e19517f98e4d55',
  'CIE_srf_cri.csv': 'f461decedb5c18800c61a6923240c71f6cf91fd23ac94865133cbfdb7e05c0ad',
  'CIE_illum_LEDs_1nm.csv': '2a065526e1502f138d5b96aa8c9b337320e08667aac028ab5ad428bf1179a4b7'
};

describe('CIE data files', () => {
  it.each(Object.entries(checksums))('%s carries the CIE-published SHA-256', (name, sha) => {
    const bytes = readFileSync(new URL(`../../data/cie/${name}`, import.meta.url));
    expect(createHash('sha256').update(bytes).digest('hex')).toBe(sha);
  });

  it('ȳ column sums to 106.8569171011719 and ȳ(555 nm) = 1 (CIE record of the 1931 observer dataset)', () => {
    const rows = cieFile('CIE_xyz_1931_2deg.csv', 4);
    expect(Math.abs(rows.reduce((s, r) => s + r[2], 0) - 106.8569171011719)).toBeLessThan(1e-9);
    expect(rows.find((r) => r[0] === 555)![2]).toBe(1);
  });

  it('cie-tables.json holds exactly the CSV values (scripts/build-cie-tables.ts)', () => {
    const cmf = cieFile('CIE_xyz_1931_2deg.csv', 4);
    expect(tables.cmf1931.columns.x).toEqual(cmf.map((r) => r[1]));
    expect(tables.cmf1931.columns.y).toEqual(cmf.map((r) => r[2]));
    expect(tables.cmf1931.columns.z).toEqual(cmf.map((r) => r[3]));
    const tcs = cieFile('CIE_srf_cri.csv', 15);
    Object.values(tables.testColourSamples.columns).forEach((column, j) => expect(column).toEqual(tcs.map((r) => r[j + 1])));
    const day = cieFile('CIE_illum_Dxx_comp.csv', 4);
    expect(tables.daylightComponents.columns.S0).toEqual(day.map((r) => r[1]));
    expect(tables.daylightComponents.columns.S2).toEqual(day.map((r) => r[3]));
    expect(tables.cmf1931.startNm).toBe(360);
    expect(tables.testColourSamples.stepNm).toBe(5);
  });
});

/**
 * Files a designer takes into a review, from the dome page in a real browser: the chart picture is a
 * slide (≥ 1600 px wide) named by page, scenario and content; the IES file of the scenario's far field
 * parses and is ASCII; names of two variants differ.
 */
import { expect, test, type Download, type Page } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { parseIes } from '../../src/lib/export/ies';

async function openDomeWithTrace(page: Page): Promise<void> {
  await page.goto('/dome');
  await expect(page).toHaveURL(/[?&]s=/);
  // the trace runs by itself on open
  await expect(page.getByRole('heading', { name: 'Far field' })).toBeVisible({ timeout: 30_000 });
}

async function saved(page: Page, click: () => Promise<void>): Promise<{ download: Download; bytes: Buffer }> {
  const [download] = await Promise.all([page.waitForEvent('download'), click()]);
  const path = await download.path();
  return { download, bytes: readFileSync(path!) };
}

/** Width and height from a PNG's IHDR chunk (PNG specification, ISO/IEC 15948, §11.2.2). */
function pngSize(bytes: Buffer): { width: number; height: number } {
  expect(bytes.subarray(1, 4).toString('ascii')).toBe('PNG');
  return { width: bytes.readUInt32BE(16), height: bytes.readUInt32BE(20) };
}

test.describe('exports for a design review', () => {
  test('a chart saves as a 1600 × 900 picture named by page, scenario and content', async ({ page }) => {
    await openDomeWithTrace(page);
    const { download, bytes } = await saved(page, () =>
      page.getByRole('button', { name: 'Save PNG: Far field: polar plot' }).click()
    );
    expect(download.suggestedFilename()).toBe('outcouple-dome-demo-blue-1-mm-chip-silicone-choice-far-field-polar.png');
    expect(pngSize(bytes)).toEqual({ width: 1600, height: 900 });
    if (process.env.EXPORT_PNG_COPY) await download.saveAs(process.env.EXPORT_PNG_COPY);
    const ledger = await saved(page, () => page.getByRole('button', { name: 'Save PNG: Fate of every launched ray' }).click());
    expect(pngSize(ledger.bytes).width).toBeGreaterThanOrEqual(1600);
    if (process.env.EXPORT_PNG_COPY) await ledger.download.saveAs(process.env.EXPORT_PNG_COPY.replace(/\.png$/, '-ledger.png'));
  });

  test('the IES file of the scenario parses, is ASCII before TILT and carries the asked flux', async ({ page }) => {
    await openDomeWithTrace(page);
    const { download, bytes } = await saved(page, () => page.getByRole('button', { name: 'Download IES file' }).click());
    expect(download.suggestedFilename()).toBe('outcouple-dome-demo-blue-1-mm-chip-silicone-choice-far-field.ies');
    const text = bytes.toString('latin1');
    const header = text.slice(0, text.indexOf('TILT=NONE'));
    expect(header).toMatch(/^[\x20-\x7e\r\n]*$/);
    const file = parseIes(text);
    expect(file.keywords._SMOOTHING).toMatch(/0\.05 sr/);
    // Flux of the file, 2π ∫ I sin θ dθ (CIE S 017), against the 100 lm asked: within 1 %
    expect(Math.abs(file.fluxLm - 100)).toBeLessThan(1);
  });
});

import type { Locator, Page } from '@playwright/test';

/**
 * Counts pixels of a chart canvas that differ clearly (summed RGB difference > 30) from its top-left
 * pixel, the opaque background: something was drawn. Faint antialiasing does not count.
 */
export async function drawnPixels(canvas: Locator): Promise<number> {
  return canvas.evaluate((el) => {
    const c = el as HTMLCanvasElement;
    const ctx = c.getContext('2d');
    if (!ctx || c.width === 0 || c.height === 0) return 0;
    const d = ctx.getImageData(0, 0, c.width, c.height).data;
    let n = 0;
    for (let i = 0; i < d.length; i += 4) {
      if (Math.abs(d[i] - d[0]) + Math.abs(d[i + 1] - d[1]) + Math.abs(d[i + 2] - d[2]) > 30) n++;
    }
    return n;
  });
}

/** {@link drawnPixels} of the index-th chart on the page. */
export async function inkedPixels(page: Page, index: number): Promise<number> {
  return drawnPixels(page.locator('figure.chart canvas').nth(index));
}

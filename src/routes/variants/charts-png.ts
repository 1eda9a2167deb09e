/**
 * One PNG of the comparison's charts at slide size: a title band (title, variant names), then each chart
 * drawn by the shared slide renderer (its own title and units). DOM only: call from an event handler.
 */
import { renderSlidePng } from '$lib/charts/chart';
import { slideHeader } from '$lib/charts/slide';
import type { ChartSpec } from '$lib/charts/spec';

const WIDTH = 1600;
const CHART_HEIGHT = 760;
const TITLE_HEIGHT = 96;

/** Draws `specs` one below the other under `title` and `subtitle`; returns a PNG data URL. */
export async function chartsPng(title: string, subtitle: string, specs: readonly ChartSpec[], host: HTMLElement): Promise<string> {
  const images = specs.map((spec) => renderSlidePng(spec, slideHeader(spec, subtitle), { width: WIDTH, height: CHART_HEIGHT }));
  const out = document.createElement('canvas');
  out.width = WIDTH;
  out.height = TITLE_HEIGHT + specs.length * CHART_HEIGHT;
  const ctx = out.getContext('2d');
  if (!ctx) throw new Error('this browser cannot draw a PNG (no 2-D canvas)');
  const font = getComputedStyle(host).fontFamily || 'sans-serif';
  ctx.fillStyle = '#ffffff';
  ctx.fillRect(0, 0, out.width, out.height);
  ctx.fillStyle = '#1a202c';
  ctx.textBaseline = 'top';
  ctx.font = `600 34px ${font}`;
  ctx.fillText(title, 24, 16, WIDTH - 48);
  ctx.font = `22px ${font}`;
  ctx.fillText(subtitle, 24, 60, WIDTH - 48);
  let y = TITLE_HEIGHT;
  for (const src of images) {
    const img = new Image();
    await new Promise<void>((resolve, reject) => {
      img.onload = () => resolve();
      img.onerror = () => reject(new Error('a chart image could not be read'));
      img.src = src;
    });
    ctx.drawImage(img, 0, y, WIDTH, CHART_HEIGHT);
    y += CHART_HEIGHT;
  }
  return out.toDataURL('image/png');
}

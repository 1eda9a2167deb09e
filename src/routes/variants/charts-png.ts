/**
 * One PNG of the comparison's charts at slide size: a title band (title, variant names, units in the
 * charts' own axis titles), then each chart drawn afresh at 1600 px wide. DOM only: call from an event
 * handler.
 */
import { mountChart } from '$lib/charts/chart';
import type { ChartSpec } from '$lib/charts/spec';

const WIDTH = 1600;
const CHART_HEIGHT = 640;
const TITLE_HEIGHT = 96;
const CAPTION_HEIGHT = 44;

/** Draws `specs` one below the other under `title` and `subtitle`; returns a PNG data URL. */
export async function chartsPng(title: string, subtitle: string, specs: readonly ChartSpec[], host: HTMLElement): Promise<string> {
  // Off-screen charts at the export size, styled by the page's theme (the host is inside the page).
  const holder = document.createElement('div');
  holder.style.cssText = `position:absolute;left:-20000px;top:0;width:${WIDTH}px;`;
  host.append(holder);
  const images: string[] = [];
  try {
    for (const spec of specs) {
      const box = document.createElement('div');
      box.style.cssText = `position:relative;width:${WIDTH}px;height:${CHART_HEIGHT}px;`;
      const canvas = document.createElement('canvas');
      box.append(canvas);
      holder.append(box);
      const handle = mountChart(canvas, spec);
      await new Promise((r) => requestAnimationFrame(() => r(null)));
      images.push(handle.toPng());
      handle.destroy();
    }
  } finally {
    holder.remove();
  }

  const out = document.createElement('canvas');
  out.width = WIDTH;
  out.height = TITLE_HEIGHT + specs.length * (CAPTION_HEIGHT + CHART_HEIGHT);
  const ctx = out.getContext('2d');
  if (!ctx) throw new Error('this browser cannot draw a PNG (no 2-D canvas)');
  const style = getComputedStyle(host);
  const background = style.getPropertyValue('--chart-bg').trim() || '#ffffff';
  const ink = style.getPropertyValue('--chart-ink').trim() || '#1a202c';
  const font = style.fontFamily || 'sans-serif';
  ctx.fillStyle = background;
  ctx.fillRect(0, 0, out.width, out.height);
  ctx.fillStyle = ink;
  ctx.textBaseline = 'top';
  ctx.font = `600 34px ${font}`;
  ctx.fillText(title, 24, 16, WIDTH - 48);
  ctx.font = `22px ${font}`;
  ctx.fillText(subtitle, 24, 60, WIDTH - 48);
  let y = TITLE_HEIGHT;
  for (let i = 0; i < specs.length; i++) {
    ctx.font = `600 26px ${font}`;
    ctx.fillStyle = ink;
    ctx.fillText(specs[i].title, 24, y + 10, WIDTH - 48);
    y += CAPTION_HEIGHT;
    const img = new Image();
    await new Promise<void>((resolve, reject) => {
      img.onload = () => resolve();
      img.onerror = () => reject(new Error('a chart image could not be read'));
      img.src = images[i];
    });
    ctx.drawImage(img, 0, y, WIDTH, CHART_HEIGHT);
    y += CHART_HEIGHT;
  }
  return out.toDataURL('image/png');
}

/**
 * What a chart saved for a slide carries besides the plot: a title, the scenario (and variant) it was
 * computed for, and the units of both axes — so the picture still says what it is when pasted into a
 * design review. Pure: chart.ts draws it.
 */
import type { ChartSpec } from './spec';

/** Size of a saved chart, px: a 16:9 slide at full HD width and above. */
export const SLIDE_SIZE = { width: 1600, height: 900 } as const;

export interface SlideHeader {
  title: string;
  /** Lines under the title: what it was computed for, then the units. */
  subtitle: string[];
}

/**
 * Title and subtitle lines of a saved chart.
 * @param spec the chart (its title and axis titles, which carry their units)
 * @param scenario scenario name; @param variant variant name, when the chart belongs to one
 * @example slideHeader(spec, 'Demo', 'B').subtitle[0] // 'Scenario: Demo · variant B'
 */
export function slideHeader(spec: ChartSpec, scenario: string, variant?: string): SlideHeader {
  const name = scenario.trim() || 'unnamed scenario';
  const forLine = variant && variant.trim() ? `Scenario: ${name} · variant ${variant.trim()}` : `Scenario: ${name}`;
  const units =
    spec.kind === 'polar'
      ? `Distance from the centre: ${spec.y.title.replace(/ · cos θ$/, '')}; angle from the package axis θ (°)`
      : spec.kind === 'bar'
        ? `Bars: ${spec.y.title}`
        : `Horizontal: ${spec.x.title} · vertical: ${spec.y.title}`;
  return { title: spec.title, subtitle: [forLine, units] };
}

import { migrateScenario } from './migrate';
import { parseScenario, type Scenario, type ScenarioIssue } from './schema';

export type ReadResult =
  | { ok: true; scenario: Scenario; migratedFrom: number | null }
  | { ok: false; message: string; issues: ScenarioIssue[] };

/**
 * Reads a scenario object of any known version: migrates, then validates. Never throws.
 * `message` on failure is one sentence naming the first problem's field and allowed range.
 */
export function readScenario(raw: unknown): ReadResult {
  const m = migrateScenario(raw);
  if (!m.ok) return { ok: false, message: m.message, issues: [{ path: '', message: m.message }] };
  const p = parseScenario(m.value);
  if (!p.ok) return { ok: false, message: p.issues[0].message, issues: p.issues };
  return { ok: true, scenario: p.scenario, migratedFrom: m.from === p.scenario.version ? null : m.from };
}

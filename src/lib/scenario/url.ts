/**
 * The scenario in a link: one query parameter `s` = "<version>.<base64url of the scenario's JSON>".
 * JSON keeps every number exact, so a copied link reopens exactly the same scenario.
 * Decoding never throws: a damaged, invalid or newer link gives a message and the demo scenario.
 */
import { demoScenario } from './defaults';
import { readScenario } from './read-scenario';
import { SCENARIO_VERSION, type Scenario } from './schema';
import { fromBase64Url, toBase64Url } from './base64url';

/** Name of the query parameter that carries the scenario. */
export const SCENARIO_PARAM = 's';

/** The value of the `s` parameter for a scenario: "1.eyJ2ZXJzaW9uIjox…". */
export function encodeScenarioParam(scenario: Scenario): string {
  return `${scenario.version}.${toBase64Url(JSON.stringify(scenario))}`;
}

/** "s=1.eyJ2…" — ready to put after "?" in a link. */
export function scenarioQuery(scenario: Scenario): string {
  return `${SCENARIO_PARAM}=${encodeScenarioParam(scenario)}`;
}

export interface DecodeResult {
  /** The scenario to show: the link's, or the demo scenario when the link could not be used. */
  scenario: Scenario;
  /** Why the link's scenario was not used (null when it was, or when there was none). */
  message: string | null;
  /** True when the scenario came from the link. */
  fromLink: boolean;
}

const FALLBACK = ' Showing the demo scenario instead.';

/**
 * Reads the `s` parameter. Missing → demo scenario, no message. Damaged, invalid or newer → demo
 * scenario and a message saying why. An older version is migrated.
 */
export function decodeScenarioParam(param: string | null | undefined): DecodeResult {
  if (param === null || param === undefined || param === '') {
    return { scenario: demoScenario(), message: null, fromLink: false };
  }
  const dot = param.indexOf('.');
  const versionText = dot < 0 ? '' : param.slice(0, dot);
  if (!/^\d{1,6}$/.test(versionText)) {
    return { scenario: demoScenario(), message: `The scenario in this link could not be read (damaged or cut short).${FALLBACK}`, fromLink: false };
  }
  const version = Number(versionText);
  if (version > SCENARIO_VERSION) {
    return {
      scenario: demoScenario(),
      message: `This link was made by a newer version of Outcouple (scenario version ${version}); this one reads versions up to ${SCENARIO_VERSION}.${FALLBACK}`,
      fromLink: false
    };
  }
  let raw: unknown;
  try {
    raw = JSON.parse(fromBase64Url(param.slice(dot + 1)));
  } catch {
    return { scenario: demoScenario(), message: `The scenario in this link could not be read (damaged or cut short).${FALLBACK}`, fromLink: false };
  }
  const r = readScenario(raw);
  if (!r.ok) {
    return { scenario: demoScenario(), message: `The scenario in this link is not valid: ${r.message}${FALLBACK}`, fromLink: false };
  }
  return { scenario: r.scenario, message: null, fromLink: true };
}

/** Reads the scenario from a whole query string or URLSearchParams ("?s=…&into=air"). */
export function decodeScenarioQuery(search: string | URLSearchParams): DecodeResult {
  const params = typeof search === 'string' ? new URLSearchParams(search) : search;
  return decodeScenarioParam(params.get(SCENARIO_PARAM));
}

export { LIMITS, rangeText, rangeMessage, checkNumber, MATERIAL_ID_PATTERN, type NumberLimit, type LimitName } from './limits';
export {
  SCENARIO_VERSION,
  scenarioSchema,
  parseScenario,
  assertScenario,
  type Scenario,
  type MediumSpec,
  type EncapsulantMediumSpec,
  type AnyMediumSpec,
  type EmissionSpec,
  type BaseSpec,
  type EncapsulantShape,
  type ScenarioIssue,
  type ParseResult
} from './schema';
export { DEMO_SCENARIO, DEMO_ALTERNATIVE_ENCAPSULANT, demoScenario } from './defaults';
export { migrateScenario, type MigrateResult } from './migrate';
export { readScenario, type ReadResult } from './read-scenario';
export {
  SCENARIO_PARAM,
  encodeScenarioParam,
  scenarioQuery,
  decodeScenarioParam,
  decodeScenarioQuery,
  type DecodeResult
} from './url';
export {
  designWavelengthNm,
  resolveMedium,
  encapsulantK,
  resolveScenario,
  toTracePackage,
  type ResolvedMedium,
  type ResolvedBase,
  type ResolvedScenario
} from './resolve';
export { phosphorPlacementOf, toWhitePackage } from './phosphor-package';
export { indexRowsOf, scenarioDispersion, withDispersion } from './package-dispersion';

/** Public API of the export module: far field to IES LM-63 and CSV. Pure. */
export { symmetricFlux } from './symmetric-flux';
export {
  candelaDistribution,
  LUMENS_LIMIT,
  STEP_CHOICES_DEG,
  type FarFieldSamples,
  type CandelaDistribution
} from './candela-distribution';
export { iesOpeningMetres, packageOpening, OPENING_MAX_MM, type IesOpening, type IesOpeningShape } from './ies-opening';
export {
  writeIes,
  parseIes,
  asciiText,
  iesNumber,
  IES_VERSION_LINE,
  IES_REQUIRED_KEYWORDS,
  IES_FILE_GENERATION_SIMULATION,
  type IesWriteInput,
  type IesPhotometry
} from './ies';
export { farFieldCsv, FAR_FIELD_CSV_HEADERS } from './far-field-csv';
export { exportNumber, roundSignificant, exportJsonReplacer, CSV_SIGNIFICANT_DIGITS, JSON_SIGNIFICANT_DIGITS } from './number-text';
export { exportFileName, slug, type ExportFileNameParts } from './file-name';
export { smoothFarField, FAR_FIELD_MIN_ZONE_SR, type SmoothedFarField } from './far-field-smoothing';
export { traceIes, type TraceIesInput } from './trace-ies';
export { lumensPerChipWatt, luminousBinIntensities, whiteFluxNote } from './white-ies';

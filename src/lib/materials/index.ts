/** Material library: optical constants of LED package media, with sources and validity ranges. */
export type {
  Material,
  MaterialCategory,
  Provenance,
  Dispersion,
  DispersionModel,
  SellmeierTerm,
  NkRow,
  MaterialNote,
  RangeNm,
  IndexAt,
  ResolvedIndex,
  FieldError
} from './types';
export { MATERIAL_CATEGORIES, PROVENANCES } from './types';
export { MATERIAL_LIMITS } from './limits';
export { listMaterials, findMaterial } from './library';
export { indexAt } from './dispersion';
export { polesNm } from './poles';
export { resolveIndex } from './resolve-index';
export { userMaterialField, validateUserMaterial, type UserMaterialResult } from './user-material';
export { parseNkTable, type NkTableResult, MICROMETRE_THRESHOLD } from './nk-table';
export { materialSchema } from './material-schema';
export { RETIRED_MATERIAL_IDS, currentMaterialId } from './retired-ids';

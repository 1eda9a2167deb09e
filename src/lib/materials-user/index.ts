/**
 * User materials: the browser-side store (localStorage, versioned key) and the pure pieces it uses.
 * Other pages merge them with the library through `allMaterials()` and look one up with `findAnyMaterial(id)`.
 */
export {
  userMaterials,
  allMaterials,
  findAnyMaterial,
  isUserMaterial,
  UserMaterialStore,
  USER_MATERIALS_KEY,
  USER_STORAGE_UNAVAILABLE,
  type ImportResult
} from './user-materials.svelte';
export {
  encodeUserMaterials,
  readUserMaterialsFile,
  mergeUserMaterials,
  MAX_FILE_BYTES,
  MAX_USER_MATERIALS,
  USER_MATERIALS_FORMAT,
  USER_MATERIALS_VERSION
} from './user-materials-file';
export { emptyForm, readUserMaterialForm, userMaterialId, MAX_TERMS, type UserMaterialForm, type FormModel, type FormResult } from './user-material-form';

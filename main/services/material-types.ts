/**
 * The material types are declared in app/api (pure, shared with the renderer through the API
 * contract); the services import them from here so that storage code has one local name for them.
 */
export {
  MATERIAL_CATEGORIES, MATERIAL_FIELDS, MATERIAL_ORIGINS,
  type Material, type MaterialCategory, type MaterialFilter, type MaterialInput, type MaterialOrigin, type MaterialUsage,
} from '../../app/api/material-types.js';

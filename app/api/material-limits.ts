/** The material ranges, as the API's callers (forms, services) name them; defined in app/materials. */
export { describeRange, isInRange, MATERIAL_LIMITS, type NumberRange } from '../materials/material-limits.js';

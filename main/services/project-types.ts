/**
 * The project types are declared in app/api (pure, shared with the renderer through the API
 * contract); the services import them from here.
 */
export {
  PROJECT_FIELDS, UNIT_SYSTEMS,
  type CaseDraft, type Project, type ProjectCase, type ProjectFields, type ProjectSummary, type UnitSystem,
} from '../../app/api/project-types.js';

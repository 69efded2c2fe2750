/** The thickness series moved to the engine (sizing tries them too); the editor's imports stay as they were. */
export { familyOf, parseThicknessSeries, thicknessesFor } from '../../../app/cases/sizing/thickness-series.js';

/**
 * The physics layer raises the engine's own typed input error, so callers catch one class for
 * every bad field whether the engine or the surface physics found it.
 */
export { InputError } from '../fe/errors.js';

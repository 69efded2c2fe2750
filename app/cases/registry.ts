/**
 * The case kinds Lamina knows. Adding a kind is adding its folder and one line here.
 */
import type { CaseKind } from './case-kind.js';
import { conductionKind } from './conduction/conduction-kind.js';
import { flatKind } from './flat/flat-kind.js';
import { pipeKind } from './pipe/pipe-kind.js';
import { wallKind } from './wall/wall-kind.js';

export const CASE_KINDS: readonly CaseKind[] = [conductionKind, pipeKind, flatKind, wallKind];

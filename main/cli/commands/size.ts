/**
 * lamina size CASE.json [--format json|text] [--db PATH]
 *
 * Solves a pipe or flat case that carries a "sizing" block and prints the table across the
 * thickness series and the choice: JSON (the case's title and kind with the sizing result, SI, at
 * full precision) or, with --format text, the sizing section of the case's report as a terminal
 * shows it. The sizing itself is solveCase's (SolvedCase.sizing); this only moves it to the screen.
 */
import { renderSectionText } from '../../../app/index.js';
import { isObject } from '../../../app/base/field-checks.js';
import { EXIT_BAD_INPUT } from '../exit-code.js';
import { caseFileCommand } from './case-file-command.js';

const SIZE_HELP = `lamina size CASE.json [--format json|text] [--db PATH]

Chooses the insulation thickness of a pipe or flat case: solves the case at every thickness of
the series its "sizing" block names and prints the table across the series with the choice and
the criterion that governs it (or, when no thickness meets every criterion, which fail at the
thickest and by how much). JSON by default (SI units, temperatures in °C, times in s, money in
the currency of the economics); a readable table with --format text. Use "-" to read the case
from standard input.

The "sizing" block names the layer to size ("layer", 0 for the first insulation layer), the
thicknesses to try ("series"), the criteria switched on ("criteria") and, for costs, CO₂ and the
economic thickness, "economics". Its JSON Schema is the "sizing" property of
data/schemas/pipe-case.schema.json and data/schemas/flat-case.schema.json. Examples:
data/examples/pipe-sizing-*.json and data/examples/flat-sizing-*.json.

Exit codes: 0 sized (whether or not a thickness meets every criterion); 1 the solve failed;
2 invalid input, or a case with no "sizing" block, reported in one line that names the field.
`;

/** JSON cannot hold Infinity (a freeze time never reached within the simulated time): it is written as the string "never". */
function withoutInfinity(_key: string, value: unknown): unknown {
  return typeof value === 'number' && !Number.isFinite(value) ? 'never' : value;
}

export const sizeCommand = caseFileCommand({
  name: 'size',
  help: SIZE_HELP,
  // Refused before solving: without the block there is nothing to size, and a plain solve is `lamina solve`.
  refuse: (json) =>
    isObject(json) && json['sizing'] === undefined
      ? 'sizing: the case has no "sizing" block; add one naming the layer, its thickness series and the criteria (see the "sizing" property of data/schemas/pipe-case.schema.json), or use lamina solve.'
      : null,
  print(solved, format, io) {
    const sizing = solved.sizing;
    const section = solved.report.sections.find((s) => s.id === 'sizing');
    if (!sizing || !section) {
      io.stderr(`lamina size: sizing: a ${solved.kind} case is not sized by lamina size; only pipe and flat cases are.\n`);
      return EXIT_BAD_INPUT;
    }
    io.stdout(
      format === 'json'
        ? `${JSON.stringify({ title: solved.title, kind: solved.kind, sizing }, withoutInfinity, 2)}\n`
        : `${solved.title}\n\n${renderSectionText(section)}`,
    );
    return 0;
  },
});

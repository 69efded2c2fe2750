/**
 * The engine's refusal as the case editor shows it beside a box. The engine names a field by its
 * case-file path and writes its figures in SI (the command line's sentence); a person at the form
 * reads the box's label and the box's unit. So the sentence is written in the display units the
 * boxes show (millimetres in an SI project, inches in a US one: app/base/quantity-sentence
 * writeShownSentence), and the path it opens with is replaced by the words the form uses for that
 * field ("Thickness of layer 1"). A path the form has no words for is left as the engine wrote it.
 */
import { openedWithName } from '../shared/named-refusal.js';
import { boundedMessage } from '../../../app/base/input-error.js';
import { writeShownSentence, type Sentence } from '../../../app/base/quantity-sentence.js';
import { quantityText } from '../../../app/base/quantity-text.js';
import type { UnitSystem } from '../../../app/base/unit-systems.js';
import type { Json } from './case-paths.js';
import { shownFields, type CaseKindName } from './case-form-fields.js';
import { bridgingFieldName } from './layer-bridging.js';
import { targetUFieldName } from './target-u-block.js';

/** Words for the build-up's own controls (BuildUpEditor), by the path the engine names. */
function buildUpName(path: string): string | undefined {
  if (path === 'layers') return 'The layers';
  const layer = /^layers\[(\d+)\]\.(thickness|ventilation|openingArea|material|materialId)$/.exec(path);
  if (layer) {
    const n = Number(layer[1]) + 1;
    const what = { thickness: 'Thickness', ventilation: 'Ventilation', openingArea: 'Vent opening area', material: 'Material', materialId: 'Material' }[layer[2] as 'thickness'];
    return `${what} of layer ${n}`;
  }
  const named: Record<string, string> = {
    'pipe.material': 'Pipe material',
    'pipe.materialId': 'Pipe material',
    'wall.material': 'Material of the plate behind the insulation',
    'wall.materialId': 'Material of the plate behind the insulation',
    'wall.thickness': 'Plate thickness',
    'jacket.material': 'Jacket material',
    'jacket.materialId': 'Jacket material',
    'jacket.thickness': 'Jacket thickness',
    'jacket.emissivity': 'Emissivity of the jacket surface',
  };
  return named[path] ?? bridgingFieldName(path) ?? targetUFieldName(path);
}

/** The words the form names the field at `path` by, or undefined where it has none. */
export function fieldName(kind: CaseKindName, doc: Json, path: string): string | undefined {
  return shownFields(kind, doc).find((f) => f.path === path)?.label ?? buildUpName(path);
}

/**
 * The refusal's sentence in the project's display units, opening with the field's name where the
 * engine opened it with the field's path.
 */
export function refusalText(field: string | undefined, sentence: Sentence, system: UnitSystem, kind: CaseKindName, doc: Json): string {
  const written = writeShownSentence(sentence, quantityText(system));
  const name = field === undefined ? undefined : fieldName(kind, doc, field);
  // Some sentences open "path: …" (the fractions of a layer's sections that add up to 1 or more).
  if (field !== undefined && name !== undefined && written.startsWith(`${field}: `)) return boundedMessage(`${name}${written.slice(field.length)}`);
  return boundedMessage(openedWithName(written, field, name));
}

/**
 * A refusal from the engine or a service opens with the field's path ("layers[0].thickness must
 * be …", "firmName must be …"), which the command line prints as it is; beside a box the sentence
 * opens with the box's label instead. A sentence that does not open with the path is left alone.
 */
export function openedWithName(message: string, path: string | undefined, name: string | undefined): string {
  return path !== undefined && name !== undefined && message.startsWith(`${path} `) ? `${name}${message.slice(path.length)}` : message;
}

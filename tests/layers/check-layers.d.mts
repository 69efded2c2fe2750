export interface Violation {
  readonly file: string;
  readonly line: number;
  readonly message: string;
}

export function checkLayers(projectRoot: string): { violations: Violation[]; filesChecked: number };

export function blankCommentsAndStrings(source: string): { withoutComments: string; bare: string };

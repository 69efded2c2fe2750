/** Text lengths a project accepts, shared by the storage checks and the project form. */
export const PROJECT_LIMITS = { name: 200, text: 200, revision: 40, revisionNote: 500, notes: 10000, caseName: 200 } as const;

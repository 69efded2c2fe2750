/**
 * What a letterhead accepts, shared by the storage checks (main/services/letterhead-validation.ts)
 * and the letterhead form (which stops typing at the lengths and refuses a logo file that is too
 * large before reading it).
 */
export const LETTERHEAD_LIMITS = { firmName: 200, address: 500, telephone: 60, email: 200 } as const;

/** The largest logo file accepted, in bytes (1 MiB). */
export const MAX_LOGO_BYTES = 1_048_576;

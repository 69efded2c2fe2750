/** The caution every moisture check carries (design notes: checks never decide alone that something is safe). */
export const MOISTURE_CAUTION =
  'This is a simplified steady-state assessment (ISO 13788 method): it ignores air leakage, rain, built-in moisture, ' +
  'capillary transport and moisture storage in materials. Confirm the design against local building codes and have it ' +
  'reviewed by a licensed professional before relying on it.';

/**
 * The caution a report carries when no check supplies one (a raw conduction case): the figures
 * are only as good as the inputs, and a design that protects people or property is confirmed
 * against local codes and by licensed practice (design notes: checks never decide alone).
 */
export const GENERAL_CAUTION =
  'These figures follow from the inputs as given and a one-dimensional model; they are an engineering estimate, not a ' +
  'design approval. Confirm any design that protects people or property against local codes and licensed professional practice.';

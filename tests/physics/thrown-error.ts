/** Runs `action`, which must throw, and returns what it threw (fails the test if nothing was thrown). */
export function thrownBy(action: () => unknown): unknown {
  try {
    action();
  } catch (error) {
    return error;
  }
  throw new Error('expected the call to throw, but it returned normally');
}

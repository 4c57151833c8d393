import { beforeEach } from "vitest";

/**
 * A value made afresh inside each test of the enclosing `describe` (in a beforeEach), never while the
 * test file is collected and never shared between tests. Mutation testing (npm run mutate) credits
 * engine code to the test that ran it: code run while a file is collected counts for no test, so a
 * mutant it reaches must be re-judged with every module reloaded, and a memoised result would credit
 * only the first test that read it.
 */
export function perTest<T>(make: () => T): () => T {
  let value: { v: T } | undefined;
  beforeEach(() => {
    value = { v: make() };
  });
  return () => {
    if (!value) throw new Error("perTest: read outside a test");
    return value.v;
  };
}

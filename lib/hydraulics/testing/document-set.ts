/**
 * The documents an engine test file sizes, kept as their builders. A builder is registered while the
 * file is collected (plain data: no engine code runs then) and called inside a test, which sizes the
 * fresh document itself — so per-test coverage (npm run mutate) credits the test that reads the result,
 * and no result is kept from one test to the next. A sweep test sizes every registered document again.
 */
export function documentSet() {
  const makers: (() => unknown)[] = [];
  return {
    /** Registers a builder for the sweep; returns it unchanged. */
    add<T>(make: () => T): () => T {
      makers.push(make);
      return make;
    },
    /** A fresh copy of every registered document, in the order registered. */
    all: (): unknown[] => makers.map((make) => make()),
  };
}

// Each group against a named control: Dunnett's simultaneous test, or Welch t-tests with
// Holm's adjustment when variances differ. One method per file; this module gathers them.
export * from "./control-comparison-types.js";
export * from "./dunnett-test.js";
export * from "./welch-vs-control-holm.js";

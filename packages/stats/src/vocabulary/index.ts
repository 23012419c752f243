/**
 * @waymark/stats/vocabulary — the ids every package stores and the words users see for them.
 * Dependency-free so the web bundle and @waymark/contract can import it without the engine.
 */
export * from "./ids.js";
export * from "./names.js";
export * from "./posthoc-family.js";
export type { CodedText } from "./coded-text.js";

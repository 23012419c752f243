/**
 * @waymark/contract — the one description of every shape that crosses a package boundary: zod
 * schemas for API request and response bodies (the API parses with them, its tests check
 * responses with them, the web infers its types from them), the shared enums and every limit.
 * Statistical ids and words come from @waymark/stats's vocabulary; the result of analyze() is
 * typed by @waymark/stats (AnalysisResult).
 */
export * from "./limits.js";
export * from "./enums.js";
export * from "./common.js";
export * from "./studies.js";
export * from "./datasets.js";
export * from "./analyses.js";
export * from "./reviews.js";
export * from "./power.js";
export * from "./auth.js";
export * from "./organization.js";
export * from "./people.js";
export * from "./report.js";
